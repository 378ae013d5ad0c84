// Local stand-in for an SMTP relay: accepts every message and shows it over a
// small HTTP API, so development and tests can read sign-up and reset mails.
import { randomUUID } from "node:crypto";
import fs from "node:fs";
import http from "node:http";
import { simpleParser, type AddressObject } from "mailparser";
import { SMTPServer } from "smtp-server";

interface StoredMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
}

const LIMIT = 500;
const smtpPort = Number(process.env.MAIL_FAKE_SMTP_PORT ?? 1025);
const httpPort = Number(process.env.MAIL_FAKE_HTTP_PORT ?? 1080);
const storeFile = process.env.MAIL_FAKE_STORE || undefined;
let messages: StoredMessage[] = [];

function load(): void {
  if (!storeFile || !fs.existsSync(storeFile)) return;
  for (const line of fs.readFileSync(storeFile, "utf8").split("\n")) {
    try {
      if (line.trim()) messages.push(JSON.parse(line) as StoredMessage);
    } catch {
      /* a line cut short by a crash is not worth failing for */
    }
  }
  if (messages.length > LIMIT) {
    messages = messages.slice(-LIMIT);
    // Compact, so the file does not grow without end across restarts.
    fs.writeFileSync(storeFile, messages.map((m) => `${JSON.stringify(m)}\n`).join(""));
  }
}

function keep(m: StoredMessage): void {
  messages.push(m);
  if (messages.length > LIMIT) messages.shift();
  if (storeFile) fs.appendFileSync(storeFile, `${JSON.stringify(m)}\n`);
}

const addresses = (a: AddressObject | AddressObject[] | undefined): string[] =>
  [a ?? []]
    .flat()
    .flatMap((o) => o.value.map((v) => v.address ?? ""))
    .filter(Boolean);

const smtp = new SMTPServer({
  authOptional: true,
  allowInsecureAuth: true,
  disabledCommands: ["STARTTLS"],
  logger: false,
  closeTimeout: 1000,
  size: 25 * 1024 * 1024,
  // Any credentials are fine: the app may be configured with a user/password.
  onAuth: (auth, _session, cb) => cb(null, { user: auth.username ?? "anyone" }),
  onData(stream, session, cb) {
    simpleParser(stream)
      .then((mail) => {
        // The envelope is what was really delivered (it includes Bcc).
        const envelope = session.envelope.rcptTo.map((r) => r.address);
        const from = session.envelope.mailFrom;
        keep({
          id: randomUUID(),
          from: mail.from?.text || (from ? from.address : ""),
          to: envelope.length ? envelope : addresses(mail.to),
          subject: mail.subject ?? "",
          text: mail.text ?? "",
          html: typeof mail.html === "string" ? mail.html : null,
          receivedAt: new Date().toISOString(),
        });
        cb();
      })
      .catch((err: Error) => cb(err));
  },
});

function send(res: http.ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { "content-type": "application/json" });
  res.end(JSON.stringify(body));
}

const api = http.createServer((req, res) => {
  const url = new URL(req.url ?? "/", "http://localhost");
  if (url.pathname !== "/messages") return send(res, 404, { error: "not found" });
  if (req.method === "DELETE") {
    messages = [];
    if (storeFile) fs.writeFileSync(storeFile, "");
    return send(res, 200, { deleted: true });
  }
  if (req.method !== "GET") return send(res, 405, { error: "method not allowed" });
  const to = url.searchParams.get("to")?.toLowerCase();
  const list = messages.filter((m) => !to || m.to.some((a) => a.toLowerCase() === to)).reverse();
  send(res, 200, { messages: list });
});

type Listener = { listen(port: number, host: string, cb: () => void): unknown; once(e: "error", cb: (err: Error) => void): unknown };

function listen(server: Listener, port: number): Promise<void> {
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
}

async function main(): Promise<void> {
  load();
  await listen(smtp, smtpPort);
  await listen(api, httpPort);
  smtp.on("error", (err) => console.error("mail-fake smtp error:", err.message));
  console.log(
    `mail-fake: smtp 127.0.0.1:${smtpPort}, http 127.0.0.1:${httpPort}, ` + `${messages.length} stored message(s)${storeFile ? ` in ${storeFile}` : ""}`,
  );
}

function shutdown(): void {
  // Open keep-alive or SMTP sessions must not hold the exit back.
  setTimeout(() => process.exit(0), 1500).unref();
  api.closeAllConnections();
  api.close();
  smtp.close(() => process.exit(0));
}
process.once("SIGTERM", shutdown);
process.once("SIGINT", shutdown);

main().catch((err: Error) => {
  console.error(`mail-fake failed to start: ${err.message}`);
  process.exit(1);
});
