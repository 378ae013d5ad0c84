"use client";

import { useCallback, useState } from "react";
import { loadFfmpeg } from "@/lib/uploads/trim/ffmpeg-loader";
import { trimFile } from "@/lib/uploads/trim/trim-file";

export interface TrimState {
  phase: "idle" | "loading" | "trimming" | "error";
  /** ffmpeg's latest log line while it works. */
  line: string;
  error: string | null;
}

/** Runs one trim at a time and tells the panel how far it is. */
export function useTrim() {
  const [state, setState] = useState<TrimState>({ phase: "idle", line: "", error: null });
  const run = useCallback(async (file: File, start: number, end: number): Promise<Awaited<ReturnType<typeof trimFile>> | null> => {
    setState({ phase: "loading", line: "", error: null });
    try {
      await loadFfmpeg();
      setState({ phase: "trimming", line: "", error: null });
      const out = await trimFile(file, start, end, (line) => setState((s) => ({ ...s, line })));
      setState({ phase: "idle", line: "", error: null });
      return out;
    } catch (e) {
      const why = e instanceof Error ? e.message : String(e);
      setState((s) => ({ ...s, phase: "error", error: `The file could not be trimmed in the browser: ${why}` }));
      return null;
    }
  }, []);
  return { ...state, busy: state.phase === "loading" || state.phase === "trimming", run };
}
