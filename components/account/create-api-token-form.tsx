"use client";

import { useActionState, useState } from "react";
import { createApiTokenAction, type CreateApiTokenState } from "@/app/(workspace)/account/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Label } from "@/components/ui/label";
import { Select } from "@/components/ui/select";
import { idleState } from "@/lib/action-state";
import { apiTokenLifetimesDays } from "@/lib/validations/api-token";

const lifetimeLabels: Record<(typeof apiTokenLifetimesDays)[number], string> = { 7: "7 days", 30: "30 days", 90: "90 days", 365: "1 year" };

/**
 * Creates a personal API token. The token itself is shown once, right after it is created (only a
 * digest is stored), with a copy button and the header a script sends it in.
 */
export function CreateApiTokenForm() {
  const [state, formAction, pending] = useActionState(createApiTokenAction, idleState() as CreateApiTokenState);
  const [copiedSecret, setCopiedSecret] = useState<string | null>(null);
  const hasFieldErrors = Object.keys(state.fieldErrors).length > 0;

  return (
    <div className="grid gap-4">
      {state.status === "success" && state.secret ? (
        <div className="grid gap-2 rounded-md border border-success/40 bg-success-soft p-3" role="status">
          <p className="text-sm font-medium text-success-soft-foreground">{state.message}</p>
          <Label htmlFor="new-api-token">New token{state.tokenName ? ` "${state.tokenName}"` : ""}</Label>
          <div className="flex gap-2">
            <Input id="new-api-token" readOnly value={state.secret} className="font-mono text-xs" onFocus={(event) => event.currentTarget.select()} />
            <Button
              variant="secondary"
              onClick={async () => {
                await navigator.clipboard.writeText(state.secret ?? "").catch(() => undefined);
                setCopiedSecret(state.secret ?? null);
              }}
            >
              {copiedSecret === state.secret ? "Copied" : "Copy"}
            </Button>
          </div>
          <p className="text-xs text-muted-foreground">
            Scripts send it as <code className="font-mono">Authorization: Bearer {state.secret.slice(0, 12)}…</code>; see the API
            reference for the routes that accept it.
          </p>
        </div>
      ) : null}
      {state.status === "error" && state.message && !hasFieldErrors ? <Alert variant="danger">{state.message}</Alert> : null}
      <form action={formAction} noValidate className="grid gap-4 sm:grid-cols-[1fr_11rem_9rem] sm:items-start">
        <Field id="api-token-name" label="Token name" hint="The script or machine that will use it." error={state.fieldErrors.name}>
          <Input name="name" defaultValue={state.values.name ?? ""} maxLength={80} required autoComplete="off" />
        </Field>
        <Field id="api-token-scope" label="Access" error={state.fieldErrors.scope}>
          <Select name="scope" defaultValue={state.values.scope ?? "read"}>
            <option value="read">Read only</option>
            <option value="write">Read and write</option>
          </Select>
        </Field>
        <Field id="api-token-expiry" label="Expires after" error={state.fieldErrors.expiresInDays}>
          <Select name="expiresInDays" defaultValue={state.values.expiresInDays ?? "30"}>
            {apiTokenLifetimesDays.map((days) => (
              <option key={days} value={days}>
                {lifetimeLabels[days]}
              </option>
            ))}
          </Select>
        </Field>
        <div className="sm:col-span-3">
          <Button type="submit" pending={pending}>
            Create token
          </Button>
        </div>
      </form>
    </div>
  );
}
