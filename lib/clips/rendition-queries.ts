import "server-only";
import type { Db } from "../db";

// A clip's renditions: the stepping proxy (or why none was made), the poster and the filmstrip.

export interface RenditionRow {
  proxyKey: string | null;
  proxyReason: string;
  proxyOffsetPts: number | null;
  posterKey: string | null;
  filmstripKey: string | null;
  filmstripTiles: number | null;
}

export async function findRendition(q: Db, clipId: string): Promise<RenditionRow | undefined> {
  const r = await q("clip_renditions").where({ clip_id: clipId }).first();
  return r
    ? {
        proxyKey: r.proxy_key,
        proxyReason: r.proxy_reason,
        proxyOffsetPts: r.proxy_offset_pts === null ? null : Number(r.proxy_offset_pts),
        posterKey: r.poster_key,
        filmstripKey: r.filmstrip_key,
        filmstripTiles: r.filmstrip_tiles,
      }
    : undefined;
}

export async function saveProxy(q: Db, clipId: string, p: { proxyKey: string | null; proxyReason: string; proxyOffsetPts: number | null }): Promise<void> {
  await q("clip_renditions")
    .insert({ clip_id: clipId, proxy_key: p.proxyKey, proxy_reason: p.proxyReason, proxy_offset_pts: p.proxyOffsetPts })
    .onConflict("clip_id")
    .merge(["proxy_key", "proxy_reason", "proxy_offset_pts"]);
}

export async function saveThumbnails(q: Db, clipId: string, t: { posterKey: string; filmstripKey: string; filmstripTiles: number }): Promise<void> {
  await q("clip_renditions")
    .insert({ clip_id: clipId, proxy_reason: "", poster_key: t.posterKey, filmstrip_key: t.filmstripKey, filmstrip_tiles: t.filmstripTiles })
    .onConflict("clip_id")
    .merge(["poster_key", "filmstrip_key", "filmstrip_tiles"]);
}
