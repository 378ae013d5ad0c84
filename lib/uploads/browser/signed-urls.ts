// Presigned part URLs, asked for in batches (the part wanted now and the next ones in the queue)
// and used while fresh: the server signs them for an hour, we keep them for 45 minutes.

const BATCH = 12;
const FRESH_MS = 45 * 60_000;

type Signer = (partNumbers: number[]) => Promise<{ partNumber: number; url: string }[]>;

export class SignedUrls {
  private urls = new Map<number, { url: string; at: number }>();
  private pending = new Map<number, Promise<void>>();

  constructor(
    private readonly sign: Signer,
    private readonly now: () => number = Date.now,
  ) {}

  private fresh(n: number): boolean {
    const u = this.urls.get(n);
    return !!u && this.now() - u.at < FRESH_MS;
  }

  /** The URL for part n; signs n together with the next unsigned parts of `upcoming` when needed. */
  async get(n: number, upcoming: readonly number[]): Promise<string> {
    if (!this.fresh(n)) {
      let wait = this.pending.get(n);
      if (!wait) {
        const batch = [n, ...upcoming.filter((m) => m !== n && !this.pending.has(m) && !this.fresh(m))].slice(0, BATCH);
        wait = this.sign(batch)
          .then((list) => {
            const at = this.now();
            for (const u of list) this.urls.set(u.partNumber, { url: u.url, at });
          })
          .finally(() => batch.forEach((m) => this.pending.delete(m)));
        batch.forEach((m) => this.pending.set(m, wait!));
      }
      await wait;
    }
    const u = this.urls.get(n);
    if (!u) throw new Error(`The server did not sign part ${n}.`);
    return u.url;
  }

  forget(n: number): void {
    this.urls.delete(n);
  }
}
