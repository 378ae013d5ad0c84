// Dates as people read them, in the browser's own locale and zone. The API sends instants as ISO
// strings with a zone and calendar days as YYYY-MM-DD (which carry no zone and must not shift).

export function formatInstant(iso: string | null | undefined): string {
  if (!iso) return "—";
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toLocaleString(undefined, { dateStyle: "medium", timeStyle: "short" });
}

export function formatDay(day: string | null | undefined): string {
  if (!day) return "—";
  const [y, m, d] = day.split("-").map(Number);
  if (!y || !m || !d) return day;
  return new Date(y, m - 1, d).toLocaleDateString(undefined, { dateStyle: "medium" });
}

const pad = (n: number) => String(n).padStart(2, "0");

/** Today in the browser's zone, for <input type="date">. */
export function todayInput(now = new Date()): string {
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** An instant as the value of <input type="datetime-local">, in the browser's zone. */
export function localInput(at: Date | string = new Date()): string {
  const d = typeof at === "string" ? new Date(at) : at;
  return `${todayInput(d)}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** A datetime-local value as an ISO instant with its zone, or null when blank or not a date. */
export function instantFromInput(local: string): string | null {
  if (!local.trim()) return null;
  const d = new Date(local);
  return Number.isNaN(d.getTime()) ? null : d.toISOString();
}
