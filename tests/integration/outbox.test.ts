import net from "node:net";
import { afterAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { enqueue, stopBoss } from "@/lib/jobs";
import { attemptDelivery } from "@/lib/notifications/deliver";
import { notifyDiscrepancy, notifyResultsReleased } from "@/lib/notifications/events";
import { queueMail } from "@/lib/notifications/outbox";
import { claimOutbox, findOutbox } from "@/lib/notifications/queries";
import { discrepancyMail } from "@/lib/notifications/templates";
import type { DropRow } from "@/lib/drops/queries";
import { demoOrganisationId, makeUser, uniqueEmail } from "../helpers/fixtures";
import { mailsTo, waitForMail } from "../helpers/mailbox";

// Outbox delivery through the real worker and the SMTP fake. The outage is real: the first attempt
// goes to a port where nothing listens (the connection is refused), as when the mail server is down.
afterAll(async () => {
  await stopBoss();
  await closeDb();
});

async function closedSmtpUrl(): Promise<string> {
  const server = net.createServer();
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  const port = (server.address() as net.AddressInfo).port;
  await new Promise((r) => server.close(r));
  return `smtp://127.0.0.1:${port}`;
}

const someMail = (tag: string) => discrepancyMail({ appUrl: "http://x.test", dropId: tag, reference: "D-T", sampleSerial: "S1", ordinal: 1, differenceS: 0.5 });
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function waitForStatus(id: string, status: string, ms = 30_000) {
  const end = Date.now() + ms;
  for (;;) {
    const row = await findOutbox(db(), id);
    if (row?.status === status || Date.now() > end) return row;
    await sleep(200);
  }
}

describe("outbox", () => {
  it("a queued mail is delivered by the worker once", async () => {
    const to = uniqueEmail("outbox");
    const [id] = await db().transaction((trx) => queueMail(trx, [{ userId: null, email: to, optOut: [] }], someMail("a")));
    const [m] = await waitForMail(to, 1, 30_000);
    expect(m.subject).toContain("Discrepancy to settle");
    expect((await waitForStatus(id, "sent"))?.status).toBe("sent");
    // Extra jobs for a sent row (a second sweep, a second worker) send nothing more.
    for (let i = 0; i < 3; i++) await enqueue("outboxSend", { outboxId: id });
    await sleep(3000);
    expect(await mailsTo(to)).toHaveLength(1);
  }, 60_000);

  it("a mail server outage loses nothing: the failed row is retried and delivered exactly once", async () => {
    const to = uniqueEmail("outage");
    // Written and tried in one transaction, so no worker can take the row before the failed attempt.
    const id = await db().transaction(async (trx) => {
      const [rowId] = await queueMail(trx, [{ userId: null, email: to, optOut: [] }], someMail("b"));
      await expect(attemptDelivery(trx, rowId, await closedSmtpUrl())).rejects.toThrow(/ECONNREFUSED|connect/i);
      return rowId;
    });
    const failed = await findOutbox(db(), id);
    expect(failed).toMatchObject({ status: "failed", attempts: 1 });
    expect(failed?.lastError).toMatch(/ECONNREFUSED|connect/i);
    const sent = await waitForStatus(id, "sent");
    expect(sent).toMatchObject({ status: "sent", attempts: 2, lastError: null });
    await sleep(3000);
    expect(await mailsTo(to)).toHaveLength(1);
  }, 60_000);

  it("a row held in 'sending' by a worker that died is sent once its lease ends", async () => {
    const to = uniqueEmail("lease");
    const id = await db().transaction(async (trx) => {
      const [rowId] = await queueMail(trx, [{ userId: null, email: to, optOut: [] }], someMail("c"));
      expect(await claimOutbox(trx, rowId, 10)).toBeTruthy();
      return rowId;
    });
    expect(await mailsTo(to)).toHaveLength(0);
    expect((await waitForStatus(id, "sent", 40_000))?.status).toBe("sent");
    expect(await mailsTo(to)).toHaveLength(1);
  }, 60_000);
});

describe("events write mail in their own transaction", () => {
  it("a new discrepancy mails every lead except one who switched it off, once per drop", async () => {
    const [on, off] = [await makeUser(["lead"]), await makeUser(["lead"], { optOut: ["discrepancy.new"] })];
    const drop = { id: crypto.randomUUID(), submissionReference: "D-TEST", sampleSerial: "B7", ordinal: 3 } as DropRow;
    await db().transaction((trx) => notifyDiscrepancy(trx, drop, 1.25));
    await db().transaction((trx) => notifyDiscrepancy(trx, drop, 1.25));
    const [m] = await waitForMail(on.email, 1, 30_000);
    expect(m.subject).toBe("Discrepancy to settle: D-TEST, ball B7, drop 3");
    expect(m.text).toContain("differ by 1.25 s");
    expect(m.text).toMatch(new RegExp(`/drops/${drop.id}`));
    await sleep(3000);
    // Other test files raise discrepancies of their own meanwhile; only this drop's mail is counted.
    expect((await mailsTo(on.email)).filter((x) => x.subject.includes("D-TEST"))).toHaveLength(1);
    expect(await mailsTo(off.email)).toHaveLength(0);
  }, 60_000);

  it("results released: the manufacturer gets the portal and report links; a rolled-back event sends nothing", async () => {
    const org = await demoOrganisationId();
    const maker = await makeUser(["manufacturer"], { organisationId: org });
    const sub = await db()("submissions").where({ organisation_id: org }).orderBy("reference").first("id");
    await expect(
      db().transaction(async (trx) => {
        await notifyResultsReleased(trx, sub.id, 91);
        throw new Error("sign-off refused");
      }),
    ).rejects.toThrow("sign-off refused");
    await db().transaction((trx) => notifyResultsReleased(trx, sub.id, 92));
    const [m] = await waitForMail(maker.email, 1, 30_000);
    expect(m.subject).toContain("results released (revision 92)");
    expect(m.text).toContain(`/portal/submissions/${sub.id}`);
    expect(m.text).toContain(`/api/submissions/${sub.id}/report.pdf`);
    await sleep(2000);
    expect(await mailsTo(maker.email)).toHaveLength(1);
  }, 60_000);
});
