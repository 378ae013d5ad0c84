// The stored form of a frame index's timestamps.

/** pts as int64 little-endian, the stored form of a frame index. */
export function encodePts(pts: readonly number[]): Buffer {
  const b = Buffer.alloc(pts.length * 8);
  pts.forEach((p, i) => b.writeBigInt64LE(BigInt(p), i * 8));
  return b;
}

export function decodePts(b: Buffer): number[] {
  const out: number[] = new Array(b.length / 8);
  for (let i = 0; i < out.length; i++) out[i] = Number(b.readBigInt64LE(i * 8));
  return out;
}
