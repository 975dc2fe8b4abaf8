"use client";

import { useActionState } from "react";
import { signUpAction } from "@/app/(auth)/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { idleState } from "@/lib/action-state";
import { useHydrated } from "@/lib/client/use-hydrated";
import { minPasswordLength } from "@/lib/validations/auth";

export interface SignUpFormProps {
  /** Same-site path to open once the account is confirmed and signed in. */
  callbackPath: string;
}

/**
 * The sign-up form. On success it shows where the confirmation link went; the account is created
 * when that link is opened (the same answer is given for an address that already has an account).
 */
export function SignUpForm({ callbackPath }: SignUpFormProps) {
  const hydrated = useHydrated();
  const [state, formAction, pending] = useActionState(signUpAction, idleState());

  if (state.status === "success") {
    return (
      <Alert variant="success" title="Check your inbox">
        {state.message}
      </Alert>
    );
  }

  const showSummary = state.status === "error" && state.message && Object.keys(state.fieldErrors).length === 0;

  return (
    <form action={formAction} noValidate className="grid gap-4">
      {showSummary ? (
        <Alert variant="danger" title="Could not create the account">
          {state.message}
        </Alert>
      ) : null}
      <input type="hidden" name="callbackPath" value={callbackPath} />
      <Field id="name" label="Name" error={state.fieldErrors.name}>
        <Input name="name" autoComplete="name" defaultValue={state.values.name} required autoFocus />
      </Field>
      <Field id="email" label="E-mail" error={state.fieldErrors.email}>
        <Input name="email" type="email" autoComplete="email" defaultValue={state.values.email} required />
      </Field>
      <Field id="password" label="Password" hint={`At least ${minPasswordLength} characters.`} error={state.fieldErrors.password}>
        <Input name="password" type="password" autoComplete="new-password" required minLength={minPasswordLength} />
      </Field>
      <Field id="confirmPassword" label="Repeat the password" error={state.fieldErrors.confirmPassword}>
        <Input name="confirmPassword" type="password" autoComplete="new-password" required />
      </Field>
      <Button type="submit" pending={pending} disabled={!hydrated} className="w-full">
        Create account
      </Button>
    </form>
  );
}
