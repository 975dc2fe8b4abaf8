"use client";

import { useActionState } from "react";
import type { EmailRequestState } from "@/app/(auth)/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { idleState } from "@/lib/action-state";
import { useHydrated } from "@/lib/client/use-hydrated";

export interface EmailRequestFormProps {
  action: (previous: EmailRequestState, formData: FormData) => Promise<EmailRequestState>;
  submitLabel: string;
}

/** One e-mail field that asks the server to send a link (sign-in link or password reset). */
export function EmailRequestForm({ action, submitLabel }: EmailRequestFormProps) {
  const hydrated = useHydrated();
  const [state, formAction, pending] = useActionState(action, idleState());

  return (
    <form action={formAction} noValidate className="grid gap-4">
      {state.status === "success" && state.message ? <Alert variant="success" title="Check your inbox">{state.message}</Alert> : null}
      {state.status === "error" && state.message && !state.fieldErrors.email ? <Alert variant="danger">{state.message}</Alert> : null}
      <Field id="email" label="E-mail" error={state.fieldErrors.email}>
        <Input name="email" type="email" autoComplete="email" defaultValue={state.values.email} required autoFocus />
      </Field>
      <Button type="submit" pending={pending} disabled={!hydrated} className="w-full">
        {state.status === "success" ? "Send another link" : submitLabel}
      </Button>
    </form>
  );
}
