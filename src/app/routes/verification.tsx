import { VerificationPage } from "@/features/history/components/verification-page.tsx";

/** Lazy route module: React Router picks up `Component`. */
export function Component() {
  return <VerificationPage />;
}
