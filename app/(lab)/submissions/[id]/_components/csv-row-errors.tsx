/** The rows the server refused, in file order, each with its line number and reason. */
export function CsvRowErrors({ fields }: { fields: Record<string, string> }) {
  const rows = Object.entries(fields)
    .map(([key, reason]) => ({ line: Number(/^line (\d+)$/.exec(key)?.[1]), reason }))
    .filter((r) => Number.isInteger(r.line))
    .sort((a, b) => a.line - b.line);
  if (rows.length === 0) return null;
  return (
    <ul aria-label="Rows to correct" className="list-disc space-y-1 pl-5 text-sm text-bad-700">
      {rows.map((r) => (
        <li key={r.line}>
          <span className="font-semibold">Line {r.line}:</span> {r.reason}
        </li>
      ))}
    </ul>
  );
}
