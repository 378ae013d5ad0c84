import type { ClipView } from "@/lib/clips/view";

type StepState = ClipView["steps"][number]["state"];

const STATE: Record<StepState, { word: string; mark: string; tone: string }> = {
  pending: { word: "Waiting", mark: "○", tone: "text-ink-600" },
  running: { word: "Running", mark: "◐", tone: "text-wick-700" },
  retrying: { word: "Retrying", mark: "↻", tone: "text-wick-700" },
  done: { word: "Done", mark: "✓", tone: "text-ok-700" },
  skipped: { word: "Skipped", mark: "–", tone: "text-ink-600" },
  not_needed: { word: "Not needed", mark: "–", tone: "text-ink-600" },
  failed: { word: "Failed", mark: "✕", tone: "text-bad-700" },
};

/** The five processing steps of a clip, each with its state, tries and reason. */
export function ClipSteps({ steps, label = "Processing steps" }: { steps: ClipView["steps"]; label?: string }) {
  if (steps.length === 0) return <p className="text-sm text-ink-600">Processing starts once the whole file is stored.</p>;
  const current = steps.find((s) => s.state === "running" || s.state === "retrying");
  const finished = steps.filter((s) => s.state === "done" || s.state === "skipped").length;
  return (
    <div className="space-y-2">
      <p className="text-sm text-ink-800" aria-live="polite">
        {finished} of {steps.length} steps finished{current ? ` · now: ${current.label.toLowerCase()}` : ""}
      </p>
      <ol aria-label={label} className="divide-y divide-ink-100 rounded-md border border-ink-100 bg-white text-sm">
        {steps.map((s, i) => {
          const st = STATE[s.state];
          return (
            <li key={s.step} className="flex gap-3 px-3 py-2">
              <span aria-hidden="true" className={`w-4 text-center font-bold ${st.tone}`}>
                {st.mark}
              </span>
              <div className="min-w-0 flex-1">
                <p>
                  <span className="font-semibold">
                    {i + 1}. {s.label}
                  </span>
                  <span className="sr-only">: </span>
                  <span className={`ml-2 font-semibold ${st.tone}`}>{st.word}</span>
                  {s.attempts > 1 && (
                    <span className="ml-2 text-ink-600">
                      {s.state === "running" || s.state === "retrying" ? `try ${s.attempts}` : `after ${s.attempts} tries`}
                    </span>
                  )}
                </p>
                {s.reason && <p className={s.state === "failed" ? "text-bad-700" : "text-ink-600"}>{s.reason}</p>}
              </div>
            </li>
          );
        })}
      </ol>
    </div>
  );
}
