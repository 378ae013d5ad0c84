import fs from "node:fs";
import path from "node:path";
import { HeadBucketCommand, S3Client } from "@aws-sdk/client-s3";
import { type Service, assertAlive, httpAnswers, logHasSince, logSize, projectRoot, spawnLogged, stopChild, waitFor } from "./service";

export interface S3Options {
  dataDir: string;
  port: number;
  buckets: string[];
  /** Browser origins allowed by bucket CORS; empty means any origin. */
  corsOrigins: string[];
  logFile: string;
  /** Log every request (s3rver is silent otherwise). */
  verbose?: boolean;
}

/** s3rver accepts exactly this hard-coded key pair and checks signatures with it. */
export const S3RVER_CREDENTIALS = { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" } as const;

/**
 * Client settings that behave the same against s3rver, MinIO and AWS: path
 * style (no bucket subdomains on 127.0.0.1) and checksums only when required,
 * since s3rver stores aws-chunked framing verbatim inside the object otherwise.
 */
export function localS3Client(endpoint: string): S3Client {
  return new S3Client({
    endpoint,
    region: "us-east-1",
    forcePathStyle: true,
    credentials: { ...S3RVER_CREDENTIALS },
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
}

const xmlEscape = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;");

export function corsXml(origins: string[]): string {
  const tag = (name: string, values: string[]) => values.map((v) => `<${name}>${xmlEscape(v)}</${name}>`);
  const rule = [
    ...tag("AllowedOrigin", origins.length ? origins : ["*"]),
    ...tag("AllowedMethod", ["GET", "PUT", "POST", "HEAD", "DELETE"]),
    ...tag("AllowedHeader", ["*"]),
    // ETag: the browser reads it from each multipart part; the rest: ranged video reads.
    ...tag("ExposeHeader", ["ETag", "Content-Range", "Content-Length", "Accept-Ranges"]),
    ...tag("MaxAgeSeconds", ["3000"]),
  ];
  return `<CORSConfiguration>\n  <CORSRule>\n    ${rule.join("\n    ")}\n  </CORSRule>\n</CORSConfiguration>\n`;
}

export async function startS3(o: S3Options): Promise<Service & { endpoint: string; accessKeyId: string; secretAccessKey: string }> {
  const dataDir = path.resolve(o.dataDir);
  fs.mkdirSync(dataDir, { recursive: true });
  // s3rver lists only folders as buckets, so the file can sit in its root.
  const corsFile = path.join(dataDir, "cors.xml");
  fs.writeFileSync(corsFile, corsXml(o.corsOrigins));

  const args = [
    path.join(projectRoot, "node_modules", ".bin", "s3rver"),
    "--directory",
    dataDir,
    "--address",
    "127.0.0.1",
    "--port",
    String(o.port),
    // Otherwise any host name but localhost/IPs is taken as a bucket name.
    "--no-vhost-buckets",
    ...(o.verbose ? [] : ["--silent"]),
    ...o.buckets.flatMap((b) => ["--configure-bucket", b, corsFile]),
  ];
  const logStart = logSize(o.logFile);
  const child = spawnLogged("s3rver", process.execPath, args, { logFile: o.logFile });
  const stop = () => stopChild(child);
  const endpoint = `http://127.0.0.1:${o.port}`;

  try {
    await waitFor(
      async () => {
        assertAlive(child, "s3rver", o.logFile);
        // The banner in our own part of the log proves that this child bound the
        // port, not some other server that was already listening there.
        return logHasSince(o.logFile, logStart, "S3rver listening on") && (await httpAnswers(endpoint));
      },
      20_000,
      `s3rver on ${endpoint} (log: ${o.logFile})`,
    );
    const client = localS3Client(endpoint);
    try {
      for (const bucket of o.buckets) await client.send(new HeadBucketCommand({ Bucket: bucket }));
    } finally {
      client.destroy();
    }
  } catch (e) {
    await stop();
    throw e;
  }
  return { name: "s3rver", endpoint, ...S3RVER_CREDENTIALS, stop };
}
