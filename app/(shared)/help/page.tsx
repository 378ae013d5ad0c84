import { Caution } from "@/components/shell/caution";

export const metadata = { title: "Help" };

export default function HelpPage() {
  return (
    <article className="max-w-3xl space-y-6">
      <h1 className="text-3xl font-bold">Help</h1>
      <section className="rounded-lg border-l-4 border-wick-500 bg-wick-100 p-5">
        <h2 className="text-lg font-semibold">Before you rely on a result</h2>
        <div className="mt-2">
          <Caution />
        </div>
        <p className="mt-2 text-sm text-ink-800">
          The demo specification edition is invented. Its minimum absorption time of 135 s is a widely used value quoted from memory, not from the governing
          document: your lab must enter the values of the edition that applies to it.
        </p>
      </section>
      <section>
        <h2 className="text-lg font-semibold">Who does what</h2>
        <dl className="mt-2 space-y-2 text-ink-800">
          <div>
            <dt className="font-semibold">Technician</dt>
            <dd>receives submissions and sample balls, records conditions, uploads drop recordings.</dd>
          </div>
          <div>
            <dt className="font-semibold">Reviewer</dt>
            <dd>marks the dispense and clear frames of each drop; never sees another reviewer&apos;s reading of the same drop until both are in.</dd>
          </div>
          <div>
            <dt className="font-semibold">Lead</dt>
            <dd>rules on discrepancies, signs results off, edits specification editions, manages users.</dd>
          </div>
          <div>
            <dt className="font-semibold">Manufacturer</dt>
            <dd>sees only its own organisation&apos;s submissions, results and reports.</dd>
          </div>
        </dl>
      </section>
      <section>
        <h2 className="text-lg font-semibold">Accounts</h2>
        <p className="mt-2 text-ink-800">
          A lead invites each person by e-mail. The link in the invitation sets a password and works once; ask a lead for a new one if it has expired. After
          five wrong passwords in a row an account waits fifteen minutes before it can try again.
        </p>
      </section>
    </article>
  );
}
