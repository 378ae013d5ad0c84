/** The standing caution: Wickmark computes, the governing specification and the lab's procedure decide. */
export function Caution({ compact = false }: { compact?: boolean }) {
  return (
    <p className={compact ? "text-xs text-ink-600" : "text-sm text-ink-800"}>
      Results can wrongly pass or fail a product. The governing specification and the testing laboratory&apos;s own accredited procedure decide every result;
      the limits and defaults shipped with Wickmark are examples only.
    </p>
  );
}
