import type { ReactNode } from "react";
import { Caution } from "@/components/shell/caution";
import { Logo } from "@/components/shell/logo";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center justify-center bg-ink-900 px-4 py-10">
      <div className="w-full max-w-md rounded-xl bg-paper p-8 shadow-xl">
        <div className="mb-6 flex items-center gap-3">
          <Logo className="h-10 w-10" />
          <div>
            <p className="text-xl font-bold tracking-tight">Wickmark</p>
            <p className="text-sm text-ink-600">Oil absorption timing for ball-testing laboratories</p>
          </div>
        </div>
        {children}
      </div>
      <div className="mt-6 max-w-md text-center text-ink-100 [&_p]:text-ink-100">
        <Caution compact />
      </div>
    </div>
  );
}
