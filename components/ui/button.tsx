import Link from "next/link";
import type { ButtonHTMLAttributes, ComponentProps } from "react";

const KINDS = {
  primary: "bg-wick-500 text-ink-900 hover:bg-wick-300 disabled:bg-ink-100 disabled:text-ink-400",
  secondary: "border border-ink-200 bg-white text-ink-800 hover:bg-ink-50 disabled:text-ink-400",
  danger: "border border-bad-700 bg-white text-bad-700 hover:bg-bad-100",
} as const;

type Kind = keyof typeof KINDS;

export function Button({ kind = "primary", className = "", ...props }: { kind?: Kind } & ButtonHTMLAttributes<HTMLButtonElement>) {
  return <button className={`rounded-md px-4 py-2 text-sm font-semibold ${KINDS[kind]} ${className}`} {...props} />;
}

/** A link that leads to an action page, drawn like a button. */
export function ButtonLink({ kind = "primary", className = "", ...props }: { kind?: Kind } & ComponentProps<typeof Link>) {
  return <Link className={`inline-block rounded-md px-4 py-2 text-sm font-semibold ${KINDS[kind]} ${className}`} {...props} />;
}
