import type { LoginInput } from "@shared/api/auth.ts";
import { SAFETY_CAUTION } from "@shared/caution.ts";
import { BrandMark } from "@/components/layouts/brand-mark.tsx";
import { ThemeToggle } from "@/components/layouts/theme-toggle.tsx";
import { SignInForm } from "./sign-in-form.tsx";

/** The sign-in screen, with the safety caution at its foot. */
export function SignInPage({ onSubmit, pending, error }: { onSubmit: (input: LoginInput) => void; pending: boolean; error: unknown }) {
  return (
    <div className="flex min-h-screen flex-col">
      <div className="flex justify-end p-3">
        <ThemeToggle />
      </div>
      <main className="flex flex-1 items-start justify-center px-4 pt-[12vh]">
        <div className="w-full max-w-sm">
          <div className="mb-6 flex items-center gap-2.5">
            <BrandMark className="h-7 w-7 text-focus" />
            <div>
              <h1 className="text-xl font-semibold tracking-wide">Bellwether</h1>
              <p className="text-muted">Severe-weather ingredient alerting</p>
            </div>
          </div>
          <div className="rounded-md border border-line bg-surface p-5">
            <SignInForm onSubmit={onSubmit} pending={pending} error={error} />
          </div>
        </div>
      </main>
      <footer className="mx-auto max-w-2xl px-4 py-6 text-center text-xs leading-relaxed text-muted">
        <p>{SAFETY_CAUTION}</p>
      </footer>
    </div>
  );
}
