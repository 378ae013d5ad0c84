"use client";

import { useState, type ChangeEvent, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { instantFromInput, localInput } from "@/components/ui/dates";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { SelectField } from "@/components/ui/select-field";
import { TextareaField } from "@/components/ui/textarea-field";
import { apiError } from "@/components/ui/form-errors";
import { useImportSamples } from "@/lib/submissions/hooks";
import { MASS_UNITS } from "./add-sample-form";
import { CsvRowErrors } from "./csv-row-errors";

const MAX_BYTES = 200_000;
const EXAMPLE = "serial,weight,unit,received_at,acclimation_started_at,notes\nQC-3001,15.98,lb,,,\nQC-3002,7249.5,g,,,";

export function ImportSamplesForm({ submissionId, currentRound }: { submissionId: string; currentRound: number }) {
  const upload = useImportSamples(submissionId);
  const [csv, setCsv] = useState("");
  const [own, setOwn] = useState<Record<string, string>>({});
  const [done, setDone] = useState<string | null>(null);
  const err = apiError(upload.error);
  const fields: Record<string, string | undefined> = { ...err?.fields, ...own };

  async function onFile(e: ChangeEvent<HTMLInputElement>) {
    const file = e.target.files?.[0];
    if (!file) return;
    if (file.size > MAX_BYTES) return setOwn({ file: `The file is ${Math.round(file.size / 1000)} kB; at most 200 kB can be imported at once.` });
    setOwn({});
    setCsv(await file.text());
  }

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const receivedAt = instantFromInput(String(data.get("receivedAt") ?? ""));
    const problems: Record<string, string> = {};
    if (!csv.trim()) problems.csv = "Paste the CSV or choose a file.";
    if (!receivedAt) problems.receivedAt = "Received at is required: it applies to every row without its own received_at.";
    setOwn(problems);
    setDone(null);
    if (Object.keys(problems).length) return;
    const round = Number(data.get("round")) || undefined;
    upload.mutate(
      { csv, unit: data.get("unit") as "g" | "oz" | "lb", round, receivedAt: receivedAt! },
      {
        onSuccess: (r) => {
          setDone(`${r.created} sample${r.created === 1 ? " was" : "s were"} imported.`);
          setCsv("");
        },
      },
    );
  }

  return (
    <section aria-labelledby="import-heading" className="rounded-lg border border-ink-100 bg-white p-5 shadow-sm">
      <h2 id="import-heading" className="text-lg font-semibold">
        Import samples from CSV
      </h2>
      <p className="mt-1 text-sm text-ink-600">
        One row per ball: serial and weight, optionally unit, received_at, acclimation_started_at and notes. A header row is optional. If any row is wrong,
        nothing is saved.
      </p>
      <form onSubmit={onSubmit} noValidate className="mt-4 grid gap-4 md:grid-cols-2">
        <div className="md:col-span-2">
          <TextareaField
            id="import-csv"
            label="CSV rows"
            rows={6}
            value={csv}
            onChange={(e) => setCsv(e.target.value)}
            placeholder={EXAMPLE}
            spellCheck={false}
            className="block w-full rounded-md border border-ink-200 bg-white px-3 py-2 font-mono text-sm"
            error={fields.csv}
          />
        </div>
        <Field id="import-file" type="file" label="Or choose a CSV file" accept=".csv,text/csv,text/plain" onChange={onFile} error={fields.file} />
        <SelectField id="import-unit" name="unit" label="Weight unit for rows without one" defaultValue="g" error={fields.unit}>
          {MASS_UNITS.map((u) => (
            <option key={u.value} value={u.value}>
              {u.label}
            </option>
          ))}
        </SelectField>
        <Field id="import-received" name="receivedAt" type="datetime-local" label="Received at" defaultValue={localInput()} error={fields.receivedAt} />
        <Field
          id="import-round"
          name="round"
          type="number"
          min={1}
          step={1}
          label="Round"
          placeholder={String(currentRound)}
          hint={`Blank means the current round, ${currentRound}.`}
          error={fields.round}
        />
        <div className="space-y-3 md:col-span-2">
          {err && <Notice tone="error">{err.message}</Notice>}
          {err && <CsvRowErrors fields={err.fields} />}
          {done && <Notice tone="ok">{done}</Notice>}
          <Button type="submit" disabled={upload.isPending}>
            {upload.isPending ? "Importing…" : "Import samples"}
          </Button>
        </div>
      </form>
    </section>
  );
}
