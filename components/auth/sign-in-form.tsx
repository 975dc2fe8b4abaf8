"use client";

import Link from "next/link";
import { signIn } from "next-auth/react";
import { useActionState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { idleState, invalidState, readFields, type ActionState, type FieldsOf } from "@/lib/action-state";
import { signInSchema } from "@/lib/validations/auth";
import { useHydrated } from "@/lib/client/use-hydrated";

type SignInState = ActionState<FieldsOf<typeof signInSchema>>;

export interface SignInFormProps {
  /** Same-site path to open after signing in. */
  callbackPath: string;
  defaultEmail?: string;
}

export function SignInForm({ callbackPath, defaultEmail = "" }: SignInFormProps) {
  const hydrated = useHydrated();
  const [state, formAction, pending] = useActionState(async (_previous: SignInState, formData: FormData): Promise<SignInState> => {
    const fields = readFields(formData, ["email", "password"]);
    const kept = { email: fields.email };
    const parsed = signInSchema.safeParse(fields);
    if (!parsed.success) return invalidState(parsed.error.issues, kept);
    const result = await signIn("password", { ...parsed.data, redirect: false });
    if (!result?.ok || result.error) {
      return { status: "error", message: result?.error ?? "Signing in failed. Please try again.", fieldErrors: {}, values: kept };
    }
    // A full page load, so the header and every server component see the new session.
    window.location.assign(callbackPath);
    return { status: "success", message: null, fieldErrors: {}, values: kept };
  }, idleState());

  return (
    <form action={formAction} noValidate className="grid gap-4">
      {state.status === "error" && state.message ? (
        <Alert variant="danger" title="Could not sign in">
          {state.message}
        </Alert>
      ) : null}
      <Field id="email" label="E-mail" error={state.fieldErrors.email}>
        <Input name="email" type="email" autoComplete="email" defaultValue={state.values.email ?? defaultEmail} required autoFocus />
      </Field>
      <Field id="password" label="Password" error={state.fieldErrors.password}>
        <Input name="password" type="password" autoComplete="current-password" required />
      </Field>
      <div className="-mt-2 flex justify-end">
        <Link href="/reset-password" className="text-sm text-accent hover:underline">
          Forgot your password?
        </Link>
      </div>
      <Button type="submit" pending={pending} disabled={!hydrated} className="w-full">
        Sign in
      </Button>
    </form>
  );
}
