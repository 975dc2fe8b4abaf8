"use client";

import Link from "next/link";
import { signIn } from "next-auth/react";
import { useActionState } from "react";
import { confirmSignUpAction, type ConfirmSignUpState } from "@/app/(auth)/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { idleState } from "@/lib/action-state";
import { useHydrated } from "@/lib/client/use-hydrated";

export interface ConfirmSignUpFormProps {
  token: string;
  /** The address the link was mailed to (shown, and used to sign in afterwards). */
  email: string;
  /** Same-site path to open once signed in. */
  callbackPath: string;
}

/**
 * Finishes a sign-up from its mailed link: the password chosen at sign-up is asked for again, so
 * only the person who started the sign-up can finish it, then the new account signs in.
 */
export function ConfirmSignUpForm({ token, email, callbackPath }: ConfirmSignUpFormProps) {
  const hydrated = useHydrated();
  const [state, formAction, pending] = useActionState(async (previous: ConfirmSignUpState, formData: FormData): Promise<ConfirmSignUpState> => {
    const result = await confirmSignUpAction(previous, formData);
    if (result.status !== "success") return result;
    const signedIn = await signIn("password", { email, password: formData.get("password"), redirect: false });
    // The account exists now; if signing in did not work, the sign-in page can do it.
    window.location.assign(signedIn?.ok && !signedIn.error ? callbackPath : "/sign-in");
    return result;
  }, idleState());
  const tokenProblem = state.fieldErrors.token?.[0];

  if (tokenProblem) {
    return (
      <Alert variant="danger" title="This link cannot be used">
        {tokenProblem}{" "}
        <Link href="/sign-in" className="font-medium underline">
          Sign in
        </Link>{" "}
        or{" "}
        <Link href="/sign-up" className="font-medium underline">
          sign up again
        </Link>
        .
      </Alert>
    );
  }

  return (
    <form action={formAction} noValidate className="grid gap-4">
      {state.status === "error" && state.message && Object.keys(state.fieldErrors).length === 0 ? (
        <Alert variant="danger">{state.message}</Alert>
      ) : null}
      <input type="hidden" name="token" value={token} />
      <p className="text-sm">
        Creating the account for <span className="font-medium">{email}</span>.
      </p>
      <Field id="password" label="Your password" hint="The password you chose when signing up." error={state.fieldErrors.password}>
        <Input name="password" type="password" autoComplete="current-password" required autoFocus />
      </Field>
      <Button type="submit" pending={pending} disabled={!hydrated} className="w-full">
        Finish and sign in
      </Button>
    </form>
  );
}
