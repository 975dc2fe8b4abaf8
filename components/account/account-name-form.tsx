"use client";

import { useActionState } from "react";
import { updateAccountNameAction } from "@/app/(workspace)/account/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { idleState } from "@/lib/action-state";

export function AccountNameForm({ name }: { name: string }) {
  const [state, formAction, pending] = useActionState(updateAccountNameAction, idleState());

  return (
    <form action={formAction} noValidate className="grid gap-4">
      {state.status === "success" && state.message ? <Alert variant="success">{state.message}</Alert> : null}
      {state.status === "error" && state.message && !state.fieldErrors.name ? <Alert variant="danger">{state.message}</Alert> : null}
      <Field id="account-name" label="Name" error={state.fieldErrors.name}>
        <Input name="name" autoComplete="name" defaultValue={state.values.name ?? name} required />
      </Field>
      <div>
        <Button type="submit" pending={pending}>
          Save name
        </Button>
      </div>
    </form>
  );
}
