import { Button } from "@/components/ui/button";
import { CONTROL_CLASS } from "@/components/ui/select-field";

/** A typed time (seconds or m:ss.mmm) with a button that takes the preview's current time. */
export function TimeField({
  id,
  label,
  value,
  onChange,
  onUseCurrent,
  disabled,
}: {
  id: string;
  label: string;
  value: string;
  onChange: (v: string) => void;
  onUseCurrent: () => void;
  disabled?: boolean;
}) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-ink-800">
        {label}
      </label>
      <input
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        inputMode="decimal"
        autoComplete="off"
        aria-describedby={`${id}-hint`}
        disabled={disabled}
        className={`${CONTROL_CLASS} font-mono`}
      />
      <p id={`${id}-hint`} className="text-xs text-ink-600">
        Seconds (75.5) or minutes and seconds (1:15.5).
      </p>
      <Button type="button" kind="secondary" onClick={onUseCurrent} disabled={disabled} className="mt-1">
        Set {label.toLowerCase()} to the preview&apos;s time
      </Button>
    </div>
  );
}
