"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { Theory } from "@/lib/boundary/types";
import { starterDocument } from "@/lib/designer/starter-document";
import { useCreateConfiguration } from "@/lib/client/configurations";
import { ApiError } from "@/lib/client/api-client";
import { limitText } from "@/lib/text-limit";
import { configurationTitleMaxLength } from "@/lib/validations/limits";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { SpaceSelect, type WritableGroup } from "./fork-dialog";

export interface NewConfigurationFormProps {
  groups: WritableGroup[];
  /** Preselected space (e.g. from ?group=...). */
  defaultGroupId?: string;
}

const theories: Array<{ value: Theory; label: string; hint: string }> = [
  { value: "IIA", label: "Type IIA", hint: "D = 10, even p (D0, D2, D4, D6, D8)" },
  { value: "IIB", label: "Type IIB", hint: "D = 10, odd p (D1, D3, D5, D7, D9)" },
  { value: "bosonic", label: "Bosonic", hint: "D = 26, any p; no GSO projection" },
];

/** Creates a configuration in a chosen space and theory, then opens it in the designer. */
export function NewConfigurationForm({ groups, defaultGroupId }: NewConfigurationFormProps) {
  const router = useRouter();
  const create = useCreateConfiguration();
  const [title, setTitle] = useState("");
  const [titleNote, setTitleNote] = useState<string | null>(null);
  const [theory, setTheory] = useState<Theory>("IIA");
  const [groupId, setGroupId] = useState(defaultGroupId && groups.some((g) => g.id === defaultGroupId) ? defaultGroupId : (groups[0]?.id ?? ""));
  const titleError = create.error instanceof ApiError ? create.error.issues.find((i) => i.path.includes("title"))?.message : undefined;

  return (
    <form
      className="grid max-w-xl gap-5"
      onSubmit={(event) => {
        event.preventDefault();
        create.mutate(
          { groupId, document: starterDocument(theory, title), message: "Created" },
          { onSuccess: (created) => router.push(`/configurations/${created.id}`) },
        );
      }}
    >
      <Field id="new-title" label="Title" error={titleNote ?? titleError}>
        <Input
          value={title}
          required
          onChange={(event) => {
            const limited = limitText(event.target.value, configurationTitleMaxLength, "Titles");
            setTitle(limited.text);
            setTitleNote(limited.note);
          }}
          placeholder="e.g. Probe D3 near a D7 wall"
        />
      </Field>
      <Field id="new-group" label="Space">
        <SpaceSelect groups={groups} value={groupId} onChange={(event) => setGroupId(event.target.value)} />
      </Field>
      <fieldset className="grid gap-2">
        <legend className="mb-1 text-sm font-medium">Theory</legend>
        {theories.map((option) => (
          <label key={option.value} className="flex cursor-pointer items-start gap-3 rounded-md border border-border bg-surface px-3 py-2 has-[:checked]:border-accent has-[:checked]:bg-accent-soft/50">
            <input
              type="radio"
              name="theory"
              value={option.value}
              checked={theory === option.value}
              onChange={() => setTheory(option.value)}
              className="mt-1 accent-[var(--accent)]"
            />
            <span>
              <span className="block text-sm font-medium">{option.label}</span>
              <span className="block text-xs text-muted-foreground">{option.hint}</span>
            </span>
          </label>
        ))}
      </fieldset>
      {create.error && !titleError ? <Alert variant="danger">{create.error.message}</Alert> : null}
      <div>
        <Button type="submit" pending={create.isPending} disabled={!groupId}>
          Create and open the designer
        </Button>
      </div>
    </form>
  );
}
