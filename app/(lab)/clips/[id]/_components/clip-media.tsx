import type { ClipView } from "@/app/_client/clips";

/** Poster, filmstrip and a plain preview. Frame-exact stepping is the player's job, not this one's. */
export function ClipMedia({ clip }: { clip: ClipView }) {
  if (!clip.posterUrl && !clip.filmstrip && !clip.playback) return null;
  return (
    <section aria-labelledby="media-heading" className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="media-heading" className="text-xl font-semibold">Pictures and preview</h2>
      {clip.playback && (
        <figure className="space-y-1">
          <video controls crossOrigin="anonymous" preload="metadata" src={clip.playback.url} poster={clip.posterUrl ?? undefined} aria-label={`Preview of ${clip.originalName}`} className="max-h-[32rem] w-full rounded bg-ink-900" />
          <figcaption className="text-sm text-ink-600">
            {clip.playback.isProxy ? "The stepping proxy: every frame of the original, with its own timestamp." : "The original file."} A plain preview: it does not step frame by frame.
          </figcaption>
        </figure>
      )}
      <div className="grid gap-4 md:grid-cols-[minmax(0,1fr)_minmax(0,2fr)]">
        {clip.posterUrl && (
          <figure className="space-y-1">
            <img src={clip.posterUrl} alt={`Poster frame of ${clip.originalName}`} className="w-full rounded border border-ink-100" />
            <figcaption className="text-sm text-ink-600">Poster frame</figcaption>
          </figure>
        )}
        {clip.filmstrip && (
          <figure className="space-y-1">
            <img src={clip.filmstrip.url} alt={`Filmstrip of ${clip.originalName}: ${clip.filmstrip.tiles} frames spread over the recording`} className="w-full rounded border border-ink-100" />
            <figcaption className="text-sm text-ink-600">Filmstrip: {clip.filmstrip.tiles} frames spread evenly over the recording</figcaption>
          </figure>
        )}
      </div>
    </section>
  );
}
