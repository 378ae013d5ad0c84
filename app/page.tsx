import { redirect } from "next/navigation";
import { homeFor } from "@/lib/auth/page-guard";
import { currentActor } from "@/lib/auth/session";

// The front door: each person goes to where their work starts.
export default async function Home() {
  const actor = await currentActor();
  redirect(actor ? homeFor(actor) : "/sign-in");
}
