import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { loginInput, type LoginInput } from "@shared/api/auth.ts";
import { Button } from "@/components/ui/button.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { TextField } from "@/components/ui/text-field.tsx";
import { isApiError } from "@/lib/api-client.ts";
import { describeError } from "@/lib/describe-error.ts";

/** What to tell the user when sign-in fails. Bad credentials stay generic on purpose. */
export function signInFailureMessage(error: unknown): string {
  if (isApiError(error) && error.status === 401) return "Username or password not recognised.";
  if (isApiError(error) && error.status === 429) {
    return "Too many sign-in attempts from here. Wait a few minutes, then try again.";
  }
  return describeError(error).message;
}

export function SignInForm({
  onSubmit,
  pending,
  error,
}: {
  onSubmit: (input: LoginInput) => void;
  pending: boolean;
  error: unknown;
}) {
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm({ resolver: zodResolver(loginInput), defaultValues: { username: "", password: "" } });

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3" aria-label="Sign in">
      <TextField
        label="Username"
        autoComplete="username"
        autoCapitalize="none"
        spellCheck={false}
        autoFocus
        mono
        error={errors.username?.message}
        {...register("username")}
      />
      <TextField label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...register("password")} />
      {error != null && <Notice tone="danger">{signInFailureMessage(error)}</Notice>}
      <Button type="submit" variant="primary" disabled={pending} className="mt-1">
        {pending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
