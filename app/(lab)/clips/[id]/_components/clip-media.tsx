"use client";

import { FramePlayer } from "@/components/player/lazy-frame-player";
import { Notice } from "@/components/ui/notice";
import { useFrameIndex, type ClipView } from "@/lib/clips/hooks";

/** The frame-exact player (view only, no marks), with the poster and filmstrip the worker made. */
export function ClipMedia({ clip }: { clip: ClipView }) {
  const index = useFrameIndex(clip.id, clip.playback !== null);
  if (!clip.posterUrl && !clip.filmstrip && !clip.playback) return null;
  return (
    <section aria-labelledby="media-heading" className="space-y-4 rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="media-heading" className="text-xl font-semibold">
        Pictures and player
      </h2>
      {clip.playback && (
        <div className="space-y-1">
          {index.isPending && (
            <p className="text-ink-600" role="status">
              Loading the frame index…
            </p>
          )}
          {index.isError && <Notice tone="error">{index.error.message}</Notice>}
          {index.data && (
            <FramePlayer
              src={clip.playback.url}
              poster={clip.posterUrl}
              title={clip.originalName}
              frames={index.data}
              offsetPts={clip.playback.offsetPts}
              filmstrip={clip.filmstrip}
            />
          )}
          <p className="text-sm text-ink-600">
            {clip.playback.isProxy ? "Playing the stepping proxy: every frame of the original, with its own timestamp." : "Playing the original file."} Each
            frame number shown has been matched to the frame index.
          </p>
        </div>
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
            <img
              src={clip.filmstrip.url}
              alt={`Filmstrip of ${clip.originalName}: ${clip.filmstrip.tiles} frames spread over the recording`}
              className="w-full rounded border border-ink-100"
            />
            <figcaption className="text-sm text-ink-600">Filmstrip: {clip.filmstrip.tiles} frames spread evenly over the recording</figcaption>
          </figure>
        )}
      </div>
    </section>
  );
}
