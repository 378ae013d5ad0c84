// Where a clip's files live in the bucket.

export type ObjectKind = "original" | "proxy.mp4" | "poster.jpg" | "filmstrip.jpg";

/** Keys come from ids only, never from what a user typed or named a file. */
export function clipObjectKey(clipId: string, kind: ObjectKind): string {
  return `clips/${clipId}/${kind}`;
}
