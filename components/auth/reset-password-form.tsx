"use client";

import Link from "next/link";
import { useActionState } from "react";
import { resetPasswordAction } from "@/app/(auth)/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { idleState } from "@/lib/action-state";
import { useHydrated } from "@/lib/client/use-hydrated";
import { minPasswordLength } from "@/lib/validations/auth";

export function ResetPasswordForm({ token }: { token: string }) {
  const hydrated = useHydrated();
  const [state, formAction, pending] = useActionState(resetPasswordAction, idleState());
  const tokenProblem = state.fieldErrors.token?.[0];

  return (
    <form action={formAction} noValidate className="grid gap-4">
      {tokenProblem ? (
        <Alert variant="danger" title="This link cannot be used">
          {tokenProblem}{" "}
          <Link href="/reset-password" className="font-medium underline">
            Request a new link
          </Link>
          .
        </Alert>
      ) : null}
      {state.status === "error" && state.message && Object.keys(state.fieldErrors).length === 0 ? (
        <Alert variant="danger">{state.message}</Alert>
      ) : null}
      <input type="hidden" name="token" value={token} />
      <Field id="password" label="New password" hint={`At least ${minPasswordLength} characters.`} error={state.fieldErrors.password}>
        <Input name="password" type="password" autoComplete="new-password" required autoFocus minLength={minPasswordLength} />
      </Field>
      <Field id="confirmPassword" label="Repeat the new password" error={state.fieldErrors.confirmPassword}>
        <Input name="confirmPassword" type="password" autoComplete="new-password" required />
      </Field>
      <Button type="submit" pending={pending} disabled={!hydrated} className="w-full">
        Set the new password
      </Button>
    </form>
  );
}
