import path from "node:path";
import { type Service, assertAlive, httpAnswers, logHasSince, logSize, projectRoot, SERVER_TS_ARGS, spawnLogged, stopChild, waitFor } from "./service";

export interface MailFakeOptions {
  smtpPort: number;
  httpPort: number;
  /** JSON-lines file that keeps messages across restarts; memory only without it. */
  storeFile?: string;
  logFile: string;
}

export async function startMailFake(o: MailFakeOptions): Promise<Service & { smtpUrl: string; apiUrl: string }> {
  // tsx's own CLI (node_modules/.bin/tsx -> tsx/dist/cli.mjs) runs the script in
  // a second node process and only relays signals to it; loading tsx as an
  // import hook keeps a single process, so the PID we stop is the server.
  const script = path.join(projectRoot, "scripts", "mail-fake.ts");
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    MAIL_FAKE_SMTP_PORT: String(o.smtpPort),
    MAIL_FAKE_HTTP_PORT: String(o.httpPort),
  };
  if (o.storeFile) env.MAIL_FAKE_STORE = path.resolve(o.storeFile);
  else delete env.MAIL_FAKE_STORE;

  const logStart = logSize(o.logFile);
  const child = spawnLogged("mail-fake", process.execPath, [...SERVER_TS_ARGS, script], { logFile: o.logFile, env });
  const stop = () => stopChild(child);
  const apiUrl = `http://127.0.0.1:${o.httpPort}`;
  try {
    await waitFor(
      async () => {
        assertAlive(child, "mail-fake", o.logFile);
        return logHasSince(o.logFile, logStart, "mail-fake: smtp") && (await httpAnswers(`${apiUrl}/messages`));
      },
      20_000,
      `mail fake on ${apiUrl} (log: ${o.logFile})`,
    );
  } catch (e) {
    await stop();
    throw e;
  }
  return { name: "mail-fake", smtpUrl: `smtp://127.0.0.1:${o.smtpPort}`, apiUrl, stop };
}
