// Starts PostgreSQL, the S3 fake and the mail fake, uses each once, stops them.
// Run it twice: the second run must reuse the data left by the first.
// Usage: tsx scripts/services/selfcheck.ts [folder]   (default: <tmpdir>/wickmark-selfcheck)
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { GetObjectCommand, PutObjectCommand } from "@aws-sdk/client-s3";
import nodemailer from "nodemailer";
import pg from "pg";
import { startMailFake } from "./mail";
import { dataDirUsable, startPostgres } from "./postgres";
import { localS3Client, startS3 } from "./s3";
import { type Service, freePort } from "./service";

async function distinctPorts(n: number): Promise<number[]> {
  const ports = new Set<number>();
  while (ports.size < n) ports.add(await freePort());
  return [...ports];
}

async function timed<T>(label: string, fn: () => Promise<T>): Promise<T> {
  const t0 = performance.now();
  const result = await fn();
  console.log(`${label}: ${Math.round(performance.now() - t0)} ms`);
  return result;
}

function check(ok: boolean, what: string): void {
  if (!ok) throw new Error(`selfcheck failed: ${what}`);
}

async function main(): Promise<void> {
  // The SDK warns on every start about its future Node 22 requirement.
  process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= "true";
  const root = path.resolve(process.argv[2] ?? path.join(os.tmpdir(), "wickmark-selfcheck"));
  const pgDir = path.join(root, "pg");
  check(dataDirUsable(pgDir), `${pgDir} is not reachable for the PostgreSQL user; pass a folder under ${os.tmpdir()}`);
  const logs = path.join(root, "logs");
  const [pgPort, s3Port, smtpPort, httpPort] = (await distinctPorts(4)) as [number, number, number, number];
  const reuse = fs.existsSync(path.join(pgDir, "PG_VERSION"));
  console.log(`selfcheck in ${root} (${reuse ? "reusing data" : "fresh"})`);

  const services: Service[] = [];
  try {
    const db = await timed(reuse ? "postgres restart" : "postgres initdb+start", () =>
      startPostgres({
        dataDir: pgDir,
        port: pgPort,
        user: "wickmark",
        password: "selfcheck-pw",
        database: "wickmark_selfcheck",
        fast: true,
        logFile: path.join(logs, "postgres.log"),
      }),
    );
    services.push(db);
    const s3 = await timed("s3rver start", () =>
      startS3({
        dataDir: path.join(root, "s3"),
        port: s3Port,
        buckets: ["wickmark-media"],
        corsOrigins: ["http://127.0.0.1:3000"],
        logFile: path.join(logs, "s3rver.log"),
      }),
    );
    services.push(s3);
    const mail = await timed("mail fake start", () =>
      startMailFake({ smtpPort, httpPort, storeFile: path.join(root, "mail.jsonl"), logFile: path.join(logs, "mail.log") }),
    );
    services.push(mail);

    const client = new pg.Client({ connectionString: db.url });
    await client.connect();
    try {
      check((await client.query("select 1 as one")).rows[0]?.one === 1, "select 1");
      await client.query("create table if not exists selfcheck_runs (at timestamptz not null default now())");
      await client.query("insert into selfcheck_runs default values");
      const runs = Number((await client.query("select count(*) as n from selfcheck_runs")).rows[0]?.n);
      check(!reuse || runs > 1, "rows from the previous run are gone");
      console.log(`postgres: select 1 ok, ${runs} run(s) recorded`);
    } finally {
      await client.end();
    }

    const s3c = localS3Client(s3.endpoint);
    try {
      const Bucket = "wickmark-media";
      const Key = "selfcheck/persist.txt";
      if (reuse) {
        const old = await s3c.send(new GetObjectCommand({ Bucket, Key }));
        check((await old.Body?.transformToString())?.startsWith("run at ") === true, "object from the previous run");
      }
      const body = `run at ${new Date().toISOString()}`;
      await s3c.send(new PutObjectCommand({ Bucket, Key, Body: body, ContentType: "text/plain" }));
      const got = await s3c.send(new GetObjectCommand({ Bucket, Key }));
      check((await got.Body?.transformToString()) === body, "object read back differs");
      console.log("s3: put/get ok");
    } finally {
      s3c.destroy();
    }

    const subject = `Selfcheck ${Date.now()}`;
    const transport = nodemailer.createTransport(mail.smtpUrl);
    try {
      await transport.sendMail({
        from: "Wickmark <no-reply@wickmark.test>",
        to: "Lab.Tech@example.test",
        subject,
        text: "plain body",
        html: "<p>html body</p>",
      });
    } finally {
      transport.close();
    }
    const res = await fetch(`${mail.apiUrl}/messages?to=lab.tech@EXAMPLE.test`);
    const { messages } = (await res.json()) as { messages: { subject: string; html: string | null }[] };
    check(messages[0]?.subject === subject && messages[0]?.html === "<p>html body</p>", "mail not found newest first");
    check(!reuse || messages.length > 1, "mail from the previous run is gone");
    console.log(`mail: delivered and read back, ${messages.length} stored`);
  } finally {
    for (const s of services.reverse()) await s.stop();
  }
  console.log("selfcheck ok");
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exitCode = 1;
});
