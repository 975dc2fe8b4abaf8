"use client";

import { useActionState } from "react";
import { changePasswordAction } from "@/app/(workspace)/account/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { idleState } from "@/lib/action-state";
import { minPasswordLength } from "@/lib/validations/auth";

export function ChangePasswordForm({ hasPassword }: { hasPassword: boolean }) {
  const [state, formAction, pending] = useActionState(changePasswordAction, idleState());
  const hasFieldErrors = Object.keys(state.fieldErrors).length > 0;

  return (
    <form action={formAction} noValidate className="grid gap-4">
      {state.status === "success" && state.message ? <Alert variant="success">{state.message}</Alert> : null}
      {state.status === "error" && state.message && !hasFieldErrors ? <Alert variant="danger">{state.message}</Alert> : null}
      {hasPassword ? (
        <Field id="currentPassword" label="Current password" error={state.fieldErrors.currentPassword}>
          <Input name="currentPassword" type="password" autoComplete="current-password" required />
        </Field>
      ) : (
        <p className="text-sm text-muted-foreground">Your account signs in by e-mail link only. Set a password to sign in with it too.</p>
      )}
      <Field id="newPassword" label="New password" hint={`At least ${minPasswordLength} characters.`} error={state.fieldErrors.newPassword}>
        <Input name="newPassword" type="password" autoComplete="new-password" required minLength={minPasswordLength} />
      </Field>
      <Field id="confirmNewPassword" label="Repeat the new password" error={state.fieldErrors.confirmPassword}>
        <Input name="confirmPassword" type="password" autoComplete="new-password" required />
      </Field>
      <div>
        <Button type="submit" pending={pending}>
          {hasPassword ? "Change password" : "Set password"}
        </Button>
      </div>
    </form>
  );
}
