/** Wickmark's mark: a drop resting on a curved surface, with a tick of time beside it. */
export function Logo({ className = "h-8 w-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="7" fill="#1d2b3d" />
      <path d="M5 25c5-4 17-4 22 0" stroke="#faf8f4" strokeWidth="2" fill="none" strokeLinecap="round" />
      <path d="M14 8c-3 5-5 8-5 10.5a5 5 0 0 0 10 0C19 16 17 13 14 8z" fill="#f0bd6b" />
      <path d="M23 7v5l3 2" stroke="#f0bd6b" strokeWidth="1.8" fill="none" strokeLinecap="round" />
    </svg>
  );
}
