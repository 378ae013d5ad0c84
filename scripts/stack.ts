import fs from "node:fs";
import path from "node:path";
import { DEMO_LAB } from "../seeds/demo";
import { startMailFake } from "./services/mail";
import { dataDirUsable, startPostgres } from "./services/postgres";
import { startS3 } from "./services/s3";
import type { Service } from "./services/service";
import type { Profile } from "./profiles";

const PG_USER = "wickmark";
const PG_PASSWORD = "wickmark-local";

export interface Stack {
  env: Record<string, string>;
  services: Service[];
  stop(): Promise<void>;
}

/** Starts PostgreSQL, the S3 fake and the SMTP fake for a profile; returns the app's environment. */
export async function startStack(p: Profile, log: (s: string) => void): Promise<Stack> {
  const services: Service[] = [];
  const stop = async () => {
    for (const s of [...services].reverse()) await s.stop().catch((e) => log(`stopping ${s.name}: ${e}`));
    services.length = 0;
  };
  try {
    fs.mkdirSync(p.dataDir, { recursive: true });
    const logs = path.join(p.dataDir, "logs");
    const inside = path.join(p.dataDir, "pg");
    const pgDir = dataDirUsable(inside) ? inside : p.pgFallbackDir;
    if (pgDir !== inside) log(`PostgreSQL data in ${pgDir} (the project folder is not readable by the server's user)`);
    const appUrl = `http://127.0.0.1:${p.ports.app}`;

    const t0 = Date.now();
    const pg = await startPostgres({
      dataDir: pgDir,
      port: p.ports.pg,
      user: PG_USER,
      password: PG_PASSWORD,
      database: p.database,
      fast: p.fast,
      logFile: path.join(logs, "postgres.log"),
    });
    services.push(pg);
    const s3 = await startS3({
      dataDir: path.join(p.dataDir, "s3"),
      port: p.ports.s3,
      buckets: [p.bucket],
      corsOrigins: [appUrl, `http://localhost:${p.ports.app}`],
      logFile: path.join(logs, "s3.log"),
    });
    services.push(s3);
    const mail = await startMailFake({
      smtpPort: p.ports.smtp,
      httpPort: p.ports.mailApi,
      storeFile: path.join(p.dataDir, "mail.jsonl"),
      logFile: path.join(logs, "mail.log"),
    });
    services.push(mail);
    log(`services ready in ${Date.now() - t0} ms: PostgreSQL :${p.ports.pg}, S3 fake :${p.ports.s3}, SMTP fake :${p.ports.smtp}`);

    return {
      services,
      stop,
      env: {
        DATABASE_URL: pg.url,
        APP_URL: appUrl,
        NEXTAUTH_URL: appUrl,
        WICKMARK_LOCAL: "1",
        // The local stack carries the invented demo lab; its report headers say so.
        LAB_NAME: process.env.LAB_NAME ?? DEMO_LAB,
        S3_ENDPOINT: s3.endpoint,
        S3_BUCKET: p.bucket,
        S3_ACCESS_KEY_ID: s3.accessKeyId,
        S3_SECRET_ACCESS_KEY: s3.secretAccessKey,
        S3_FORCE_PATH_STYLE: "true",
        SMTP_URL: mail.smtpUrl,
        MAIL_FAKE_API_URL: mail.apiUrl,
        BCRYPT_ROUNDS: String(p.bcryptRounds),
        NEXT_DIST_DIR: p.distDir,
        NEXT_TELEMETRY_DISABLED: "1",
        AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: "true",
        WORKER_PID_FILE: path.join(p.dataDir, "worker.pid"),
        ...p.env,
      },
    };
  } catch (err) {
    await stop();
    throw err;
  }
}
