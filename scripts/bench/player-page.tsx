// The benchmark's page: the real player component on a bare page, fed from /index.json. The
// player's control is put on window so the benchmark can ask for seeks without the go-to field.
import { useRef } from "react";
import { createRoot } from "react-dom/client";
import FramePlayer from "../../components/player/frame-player";
import type { FramePlayerControl, PlayerFrames } from "../../components/player/types";

declare global {
  interface Window {
    player?: FramePlayerControl | null;
  }
}

function Page({ frames, offsetPts }: { frames: PlayerFrames; offsetPts: number }) {
  const control = useRef<FramePlayerControl>(null);
  return (
    <FramePlayer
      src="/proxy.mp4"
      title="benchmark clip"
      frames={frames}
      offsetPts={offsetPts}
      controlRef={(c) => {
        control.current = c;
        window.player = c;
      }}
    />
  );
}

void fetch("/index.json")
  .then((r) => r.json())
  .then((ix: { frames: PlayerFrames; offsetPts: number }) =>
    createRoot(document.getElementById("root")!).render(<Page frames={ix.frames} offsetPts={ix.offsetPts} />),
  );
