import net from "node:net";
import { afterAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/lib/db";
import { stopBoss } from "@/lib/jobs";
import { env } from "@/lib/env";
import { attemptDelivery } from "@/lib/notifications/deliver";
import { notifyDiscrepancy, notifyResultsReleased } from "@/lib/notifications/events";
import { queueMail } from "@/lib/notifications/outbox";
import { claimOutbox, findOutbox } from "@/lib/notifications/queries";
import { discrepancyMail } from "@/lib/notifications/templates";
import type { DropRow } from "@/lib/drops/queries";
import { demoOrganisationId, makeUser, uniqueEmail } from "../helpers/fixtures";
import { mailsTo, waitForMail } from "../helpers/mailbox";
import { deliveryJobsFor, enqueueAndWait, outboxTo, waitForOutboxStatus as waitForStatus } from "../helpers/outbox";

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
// Nothing here sleeps: a mail that must not come is checked once the worker has provably had its
// chance (a later job on the same queue has finished), and on the row's attempts, which any
// further delivery would have raised.
const sendAgain = async (id: string, times = 1) => {
  for (let i = 0; i < times; i++) expect(await enqueueAndWait("outboxSend", { outboxId: id })).toBe("completed");
};

describe("outbox", () => {
  it("a queued mail is delivered by the worker once", async () => {
    const to = uniqueEmail("outbox");
    const [id] = await db().transaction((trx) => queueMail(trx, [{ userId: null, email: to, optOut: [] }], someMail("a")));
    const [m] = await waitForMail(to, 1, 30_000);
    expect(m.subject).toContain("Discrepancy to settle");
    expect((await waitForStatus(id, "sent"))?.status).toBe("sent");
    // Extra jobs for a sent row (a second sweep, a second worker) send nothing more: once the worker
    // has finished all three, the row was never claimed again and one mail arrived.
    await sendAgain(id, 3);
    expect(await findOutbox(db(), id)).toMatchObject({ status: "sent", attempts: 1 });
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
    await waitForMail(to, 1, 30_000);
    await sendAgain(id);
    expect(await findOutbox(db(), id)).toMatchObject({ status: "sent", attempts: 2 });
    expect(await mailsTo(to)).toHaveLength(1);
  }, 60_000);

  it("a row held in 'sending' by a worker that died is sent once its lease ends", async () => {
    const to = uniqueEmail("lease");
    const id = await db().transaction(async (trx) => {
      const [rowId] = await queueMail(trx, [{ userId: null, email: to, optOut: [] }], someMail("c"));
      expect(await claimOutbox(trx, rowId, 10)).toMatchObject({ id: rowId, status: "sending", attempts: 1 });
      return rowId;
    });
    const { claimed_at: claimedAt } = await db()("outbox").where({ id }).first("claimed_at");
    const leaseEnds = new Date(claimedAt.getTime() + env().OUTBOX_LEASE_SECONDS * 1000);
    // A mail queued after the claim is swept and sent: the sweep has run while the lease held. A
    // sweep takes every due row, oldest first, so the held row would have had its job then.
    const later = uniqueEmail("lease-later");
    const [laterId] = await db().transaction((trx) => queueMail(trx, [{ userId: null, email: later, optOut: [] }], someMail("c2")));
    expect((await waitForStatus(laterId, "sent"))?.status).toBe("sent");
    expect(await deliveryJobsFor(laterId, leaseEnds), "the later mail was swept before the lease ended").toBeGreaterThan(0);
    expect(await deliveryJobsFor(id, leaseEnds)).toBe(0);
    expect(await findOutbox(db(), id)).toMatchObject({ status: "sending", attempts: 1 });
    expect(await mailsTo(to)).toHaveLength(0);
    // Once the lease is over, the next sweep gives it a job and it is sent, once.
    expect(await waitForStatus(id, "sent", 40_000)).toMatchObject({ status: "sent", attempts: 2 });
    await waitForMail(to, 1, 30_000);
    await sendAgain(id);
    expect(await mailsTo(to)).toHaveLength(1);
  }, 90_000);
});

describe("events write mail in their own transaction", () => {
  it("a new discrepancy mails every lead except one who switched it off, once per drop", async () => {
    const [on, off] = [await makeUser(["lead"]), await makeUser(["lead"], { optOut: ["discrepancy.new"] })];
    const drop = { id: crypto.randomUUID(), submissionReference: "D-TEST", sampleSerial: "B7", ordinal: 3 } as DropRow;
    expect(await db().transaction((trx) => notifyDiscrepancy(trx, drop, 1.25))).not.toHaveLength(0);
    expect(await db().transaction((trx) => notifyDiscrepancy(trx, drop, 1.25))).toEqual([]);
    // The rows were written with the event: one for this drop to the lead who wants it, none to the other.
    // (Other test files raise discrepancies of their own meanwhile; only this drop's rows are counted.)
    const [row, ...more] = await outboxTo(on.email, `/drops/${drop.id}`);
    expect(more).toHaveLength(0);
    expect(row).toMatchObject({ kind: "discrepancy.new", subject: "Discrepancy to settle: D-TEST, ball B7, drop 3" });
    expect(await outboxTo(off.email)).toEqual([]);
    expect(await waitForStatus(row.id, "sent")).toMatchObject({ status: "sent", attempts: 1 });
    const [m] = (await waitForMail(on.email, 1, 30_000)).filter((x) => x.text.includes(`/drops/${drop.id}`));
    expect(m.subject).toBe("Discrepancy to settle: D-TEST, ball B7, drop 3");
    expect(m.text).toContain("differ by 1.25 s");
    expect((await mailsTo(on.email)).filter((x) => x.text.includes(`/drops/${drop.id}`))).toHaveLength(1);
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
    // The rolled-back event left no row; the committed one left exactly one. (Other files may release
    // other results of this organisation meanwhile: only this test's two revisions are counted.)
    expect(await outboxTo(maker.email, "(revision 91)")).toEqual([]);
    const [row, ...more] = await outboxTo(maker.email, "(revision 92)");
    expect(more).toHaveLength(0);
    expect(await waitForStatus(row.id, "sent")).toMatchObject({ status: "sent", attempts: 1 });
    const mine = (await waitForMail(maker.email, 1, 30_000)).filter((x) => /\(revision 9[12]\)/.test(x.subject));
    expect(mine).toHaveLength(1);
    const [m] = mine;
    expect(m.subject).toContain("results released (revision 92)");
    expect(m.text).toContain(`/portal/submissions/${sub.id}`);
    expect(m.text).toContain(`/api/submissions/${sub.id}/report.pdf`);
  }, 60_000);
});
