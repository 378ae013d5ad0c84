import { Caution } from "@/components/shell/caution";

/** Shown on every edition page: the values here are the lab's to set, and the shipped ones are examples. */
export function EditionCaution() {
  return (
    <aside aria-label="About these values" className="rounded-lg border-l-4 border-wick-500 bg-wick-100 p-4">
      <p className="text-sm font-semibold text-ink-900">
        The demo edition&apos;s defaults are examples, not the specification. Enter the values of the edition that governs your lab, with where each one comes
        from.
      </p>
      <div className="mt-1">
        <Caution />
      </div>
    </aside>
  );
}
