/**
 * A determinate progress bar: the value is read out as a percentage and, when given, in words
 * ("5.0 MB of 16.0 MB"). `label` names what is progressing.
 */
export function ProgressBar({
  value,
  max = 100,
  label,
  valueText,
  tone = "active",
}: {
  value: number;
  max?: number;
  label: string;
  valueText?: string;
  tone?: "active" | "paused" | "done";
}) {
  const pct = max > 0 ? Math.min(100, Math.max(0, (value / max) * 100)) : 0;
  const fill = { active: "bg-wick-500", paused: "bg-ink-400", done: "bg-ok-700" }[tone];
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={Math.floor(pct)}
      aria-valuetext={valueText ? `${Math.floor(pct)} %, ${valueText}` : `${Math.floor(pct)} %`}
      className="h-3 w-full overflow-hidden rounded-full border border-ink-200 bg-ink-50"
    >
      <div className={`h-full ${fill} transition-[width] duration-200`} style={{ width: `${pct}%` }} />
    </div>
  );
}
