export default function Loading() {
  return (
    <p className="px-4 py-8 text-ink-600" role="status">
      Loading…
    </p>
  );
}
