// The submission's test report and exports, as plain links the browser downloads (the lab's results page and the portal).
const FILES = [
  { file: "report.pdf", label: "Test report (PDF)" },
  { file: "drops.csv", label: "Drops (CSV)" },
  { file: "balls.csv", label: "Ball results (CSV)" },
];

export function Downloads({ id }: { id: string }) {
  return (
    <nav aria-label="Report and exports" className="flex flex-wrap gap-3">
      {FILES.map((f) => (
        <a
          key={f.file}
          href={`/api/submissions/${id}/${f.file}`}
          download
          className="rounded border border-wick-700 px-3 py-1.5 text-sm font-semibold text-wick-700 hover:bg-wick-100"
        >
          {f.label}
        </a>
      ))}
    </nav>
  );
}
