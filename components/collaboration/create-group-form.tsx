"use client";

import { useActionState } from "react";
import { createGroupAction, type CreateGroupState } from "@/app/(workspace)/groups/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { Textarea } from "@/components/ui/textarea";
import { idleState } from "@/lib/action-state";

/** Name, kind, optional address and description of a new group; the creator becomes its owner. */
export function CreateGroupForm() {
  const [state, formAction, pending] = useActionState<CreateGroupState, FormData>(createGroupAction, idleState());
  const showSummary = state.status === "error" && state.message && Object.keys(state.fieldErrors).length === 0;
  return (
    <form action={formAction} noValidate className="grid gap-4">
      {showSummary ? (
        <Alert variant="danger" title="Could not create the group">
          {state.message}
        </Alert>
      ) : null}
      <Field id="name" label="Name" error={state.fieldErrors.name}>
        <Input name="name" defaultValue={state.values.name} required autoFocus />
      </Field>
      <Field id="kind" label="Kind" error={state.fieldErrors.kind}>
        <Select name="kind" defaultValue={state.values.kind ?? "research"}>
          <option value="research">Research group</option>
          <option value="lab">Lab (instructor and students)</option>
        </Select>
      </Field>
      <Field id="slug" label="Address (optional)" hint="Lowercase letters, digits and hyphens; derived from the name when empty." error={state.fieldErrors.slug}>
        <Input name="slug" defaultValue={state.values.slug} placeholder="brane-engineering" />
      </Field>
      <Field id="description" label="Description (optional)" error={state.fieldErrors.description}>
        <Textarea name="description" defaultValue={state.values.description} rows={3} />
      </Field>
      <div className="flex justify-end">
        <Button type="submit" pending={pending}>
          Create group
        </Button>
      </div>
    </form>
  );
}
