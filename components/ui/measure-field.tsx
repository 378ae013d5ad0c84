import type { ComponentProps } from "react";
import { describedBy, FieldMessages } from "./field-messages";
import { CONTROL_BASE } from "./select-field";

/**
 * A number with its unit picker: technicians type what the instrument shows, in its own unit,
 * and the server converts. Both controls are labelled; the error is read with the number.
 */
export function MeasureField({
  id,
  label,
  units,
  error,
  hint,
  valueProps,
  unitProps,
}: {
  id: string;
  label: string;
  units: readonly { value: string; label: string }[];
  error?: string;
  hint?: string;
  valueProps: ComponentProps<"input">;
  unitProps: ComponentProps<"select">;
}) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-ink-800">
        {label}
      </label>
      {/* The number keeps room for about eight digits; in a narrow cell the unit picker moves under it. */}
      <div className="flex flex-wrap gap-2">
        <input
          id={id}
          inputMode="decimal"
          autoComplete="off"
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(id, error, hint)}
          className={`${CONTROL_BASE} min-w-32 flex-1 basis-32`}
          {...valueProps}
        />
        <select id={`${id}-unit`} aria-label={`Unit of ${label.toLowerCase()}`} className={`${CONTROL_BASE} w-auto min-w-20 shrink-0`} {...unitProps}>
          {units.map((u) => (
            <option key={u.value} value={u.value}>
              {u.label}
            </option>
          ))}
        </select>
      </div>
      <FieldMessages id={id} error={error} hint={hint} />
    </div>
  );
}
