// How an upload is split into parts for the S3 API. Pure.

export const S3_MAX_PARTS = 10_000;
export const S3_MIN_PART = 5 * 1024 * 1024;

/** Part size and count for a file: the configured size, grown if the file would need over 10 000 parts. */
export function planParts(size: number, partSizeBytes: number): { partSize: number; partCount: number } {
  let partSize = Math.max(partSizeBytes, S3_MIN_PART);
  while (Math.ceil(size / partSize) > S3_MAX_PARTS) partSize *= 2;
  return { partSize, partCount: Math.max(1, Math.ceil(size / partSize)) };
}
