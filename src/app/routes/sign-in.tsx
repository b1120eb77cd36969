import { useNavigate, useSearchParams } from "react-router-dom";
import { safeNextPath } from "@/config/paths.ts";
import { SignInPage } from "@/features/auth/components/sign-in-page.tsx";
import { useSignIn } from "@/lib/auth.ts";

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const signIn = useSignIn();
  return (
    <SignInPage
      pending={signIn.isPending}
      error={signIn.error}
      onSubmit={(input) =>
        signIn.mutate(input, { onSuccess: () => navigate(safeNextPath(params.get("next")), { replace: true }) })
      }
    />
  );
}
