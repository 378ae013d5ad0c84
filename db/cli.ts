import { closeDb, db } from "../lib/db";
import { migrateLatest, seedDemo } from "./migrate";

// `tsx db/cli.ts migrate` or `tsx db/cli.ts seed` against DATABASE_URL.
async function main(cmd: string | undefined) {
  if (cmd === "migrate") {
    const applied = await migrateLatest(db());
    console.log(applied.length ? `migrated: ${applied.join(", ")}` : "schema is up to date");
  } else if (cmd === "seed") {
    await seedDemo(db());
    console.log("demo data present");
  } else {
    throw new Error("usage: tsx db/cli.ts migrate|seed");
  }
}

main(process.argv[2])
  .catch((err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exitCode = 1;
  })
  .finally(() => closeDb());
