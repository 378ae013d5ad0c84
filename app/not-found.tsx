import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-4 py-16 text-center">
      <p className="text-sm font-semibold uppercase tracking-wide text-wick-700">Not found</p>
      <h1 className="mt-2 text-3xl font-bold">There is nothing at this address</h1>
      <p className="mt-3 text-ink-600">The page may have moved, or you may not have access to it.</p>
      <Link href="/" className="mt-6 inline-block font-semibold text-wick-700 underline">
        Back to Wickmark
      </Link>
    </main>
  );
}
