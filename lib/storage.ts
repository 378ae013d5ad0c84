import "server-only";
import { createHash } from "node:crypto";
import { createReadStream } from "node:fs";
import { stat } from "node:fs/promises";
import type { Readable } from "node:stream";
import {
  CompleteMultipartUploadCommand,
  CreateMultipartUploadCommand,
  GetObjectCommand,
  HeadObjectCommand,
  PutObjectCommand,
  S3Client,
  UploadPartCommand,
} from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { env } from "./env";

const holder = globalThis as unknown as { __wickmarkS3?: S3Client };

/** The S3 API client. Path-style and checksums only when required, so any S3 API (AWS, MinIO, s3rver) works. */
export function s3(): S3Client {
  if (!holder.__wickmarkS3) {
    const e = env();
    holder.__wickmarkS3 = new S3Client({
      region: e.S3_REGION,
      endpoint: e.S3_ENDPOINT,
      forcePathStyle: e.S3_FORCE_PATH_STYLE,
      credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
      requestChecksumCalculation: "WHEN_REQUIRED",
      responseChecksumValidation: "WHEN_REQUIRED",
    });
  }
  return holder.__wickmarkS3;
}

const bucket = () => env().S3_BUCKET;

export async function putObject(key: string, body: Buffer | Uint8Array | string, contentType = "application/octet-stream"): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType }));
}

export async function headObject(key: string): Promise<{ size: number; contentType?: string; etag?: string }> {
  const r = await s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: key }));
  return { size: Number(r.ContentLength ?? 0), contentType: r.ContentType, etag: r.ETag };
}

/** Streams an object (or a byte range of it) without holding it in memory. */
export async function getObjectStream(key: string, range?: { start: number; end?: number }): Promise<Readable> {
  const Range = range ? `bytes=${range.start}-${range.end ?? ""}` : undefined;
  const r = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key, Range }));
  return r.Body as Readable;
}

export async function presignGet(key: string, expiresInSeconds = 900): Promise<string> {
  return getSignedUrl(s3(), new GetObjectCommand({ Bucket: bucket(), Key: key }), { expiresIn: expiresInSeconds });
}

/** SHA-256 of a stream, hex. */
export async function sha256OfStream(stream: Readable): Promise<string> {
  const hash = createHash("sha256");
  for await (const chunk of stream) hash.update(chunk as Buffer);
  return hash.digest("hex");
}

// Multipart uploads straight from the browser: the server creates, signs and completes; the
// parts never pass through the app. Parts are tracked in our database (s3rver has no ListParts).
export async function createMultipartUpload(key: string, contentType: string): Promise<string> {
  const r = await s3().send(new CreateMultipartUploadCommand({ Bucket: bucket(), Key: key, ContentType: contentType || "application/octet-stream" }));
  if (!r.UploadId) throw new Error("the object store returned no UploadId");
  return r.UploadId;
}

export async function presignUploadPart(key: string, uploadId: string, partNumber: number, expiresInSeconds = 3600): Promise<string> {
  return getSignedUrl(s3(), new UploadPartCommand({ Bucket: bucket(), Key: key, UploadId: uploadId, PartNumber: partNumber }), { expiresIn: expiresInSeconds });
}

export async function completeMultipartUpload(key: string, uploadId: string, parts: { partNumber: number; etag: string }[]): Promise<void> {
  await s3().send(
    new CompleteMultipartUploadCommand({
      Bucket: bucket(),
      Key: key,
      UploadId: uploadId,
      MultipartUpload: { Parts: parts.map((p) => ({ PartNumber: p.partNumber, ETag: p.etag })) },
    }),
  );
}

export async function objectExists(key: string): Promise<boolean> {
  try {
    await headObject(key);
    return true;
  } catch (err) {
    if ((err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return false;
    throw err;
  }
}

/** Uploads a local file by streaming it (proxies can be gigabytes). */
export async function putObjectFile(key: string, file: string, contentType: string): Promise<void> {
  const { size } = await stat(file);
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: createReadStream(file), ContentLength: size, ContentType: contentType }));
}
