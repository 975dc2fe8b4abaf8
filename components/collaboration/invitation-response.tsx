"use client";

import { signIn } from "next-auth/react";
import Link from "next/link";
import { useState, type FormEvent } from "react";
import { Alert } from "@/components/ui/alert";
import { Button, buttonClassName } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { ApiError, apiFetch } from "@/lib/client/api-client";
import { invitationSignUpSchema } from "@/lib/validations/invitation";
import { minPasswordLength } from "@/lib/validations/auth";

export interface InvitationResponseProps {
  token: string;
  invitedEmail: string;
  /** The signed-in account's e-mail, or null without a session. */
  signedInEmail: string | null;
  accountExists: boolean;
  signInHref: string;
}

interface Accepted {
  groupSlug: string;
}

type FieldErrors = Partial<Record<"name" | "password" | "confirmPassword", string>>;

/**
 * Accepting an invitation: one button when signed in with the invited address, a sign-in link
 * when the account exists, or a short sign-up form (the e-mail is the invited one) otherwise.
 */
export function InvitationResponse({ token, invitedEmail, signedInEmail, accountExists, signInHref }: InvitationResponseProps) {
  const [error, setError] = useState<string | null>(null);
  const [fieldErrors, setFieldErrors] = useState<FieldErrors>({});
  const [pending, setPending] = useState(false);

  async function accept(body: Record<string, string>): Promise<Accepted | null> {
    setPending(true);
    setError(null);
    try {
      return await apiFetch<Accepted>("/api/invitations/accept", {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ token, ...body }),
      });
    } catch (caught) {
      if (caught instanceof ApiError && caught.issues.length > 0) {
        setFieldErrors(Object.fromEntries(caught.issues.map((issue) => [String(issue.path[0]), issue.message])));
      }
      setError(caught instanceof Error ? caught.message : "The invitation could not be accepted.");
      setPending(false);
      return null;
    }
  }

  async function onAccept() {
    const accepted = await accept({});
    if (accepted) window.location.assign(`/groups/${accepted.groupSlug}`);
  }

  async function onSignUp(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const parsed = invitationSignUpSchema.safeParse({
      token,
      name: form.get("name"),
      password: form.get("password"),
      confirmPassword: form.get("confirmPassword"),
    });
    if (!parsed.success) {
      setFieldErrors(Object.fromEntries(parsed.error.issues.map((issue) => [String(issue.path[0]), issue.message])));
      return;
    }
    setFieldErrors({});
    const accepted = await accept({ name: parsed.data.name, password: parsed.data.password });
    if (!accepted) return;
    const signedIn = await signIn("password", { email: invitedEmail, password: parsed.data.password, redirect: false });
    window.location.assign(signedIn?.ok && !signedIn.error ? `/groups/${accepted.groupSlug}` : "/sign-in");
  }

  if (signedInEmail && signedInEmail.toLowerCase() === invitedEmail) {
    return (
      <div className="grid gap-3">
        {error ? <Alert variant="danger">{error}</Alert> : null}
        <Button onClick={onAccept} pending={pending}>
          Accept invitation
        </Button>
      </div>
    );
  }
  if (signedInEmail) {
    return (
      <Alert variant="warning" title="Signed in with another address">
        You are signed in as {signedInEmail}, but the invitation is for {invitedEmail}. Sign out and sign in with the invited address.
      </Alert>
    );
  }
  if (accountExists) {
    return (
      <div className="grid gap-3">
        <p className="text-sm">An account for {invitedEmail} exists. Sign in to accept.</p>
        <Link href={signInHref} className={buttonClassName()}>
          Sign in to accept
        </Link>
      </div>
    );
  }
  return (
    <form onSubmit={onSignUp} noValidate className="grid gap-4">
      <p className="text-sm text-muted-foreground">Create your Mooring account for {invitedEmail} to join.</p>
      {error && Object.keys(fieldErrors).length === 0 ? <Alert variant="danger">{error}</Alert> : null}
      <Field id="name" label="Name" error={fieldErrors.name}>
        <Input name="name" autoComplete="name" required autoFocus />
      </Field>
      <Field id="password" label="Password" hint={`At least ${minPasswordLength} characters.`} error={fieldErrors.password}>
        <Input name="password" type="password" autoComplete="new-password" required minLength={minPasswordLength} />
      </Field>
      <Field id="confirmPassword" label="Repeat the password" error={fieldErrors.confirmPassword}>
        <Input name="confirmPassword" type="password" autoComplete="new-password" required />
      </Field>
      <Button type="submit" pending={pending}>
        Create account and join
      </Button>
      <p className="text-xs text-muted-foreground">
        Already have an account under another address? Ask the owner to invite that address instead.
      </p>
    </form>
  );
}
