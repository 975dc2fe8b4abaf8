"use client";

import { useState } from "react";
import { limitText } from "@/lib/text-limit";
import { configurationTitleMaxLength } from "@/lib/validations/limits";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select, type SelectProps } from "@/components/ui/select";

/** A group the user may write to (editor or owner). */
export interface WritableGroup {
  id: string;
  name: string;
  kind: string;
}

/** A select of the spaces the user may write to, personal spaces marked; passes other props to Select. */
export function SpaceSelect({ groups, ...props }: SelectProps & { groups: WritableGroup[] }) {
  return (
    <Select {...props}>
      {groups.map((group) => (
        <option key={group.id} value={group.id}>
          {group.kind === "personal" ? `${group.name} (personal)` : group.name}
        </option>
      ))}
    </Select>
  );
}

export interface ForkDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  groups: WritableGroup[];
  defaultTitle: string;
  /** E.g. "revision 3"; shown in the description. */
  sourceLabel: string;
  pending: boolean;
  error: string | null;
  onFork: (input: { targetGroupId: string; title: string }) => void;
}

/** Picks the space that receives a fork, and its title. */
export function ForkDialog({ open, onOpenChange, groups, defaultTitle, sourceLabel, pending, error, onFork }: ForkDialogProps) {
  const [groupId, setGroupId] = useState(groups[0]?.id ?? "");
  const [title, setTitle] = useState(defaultTitle);
  const [titleNote, setTitleNote] = useState<string | null>(null);
  return (
    <Dialog
      open={open}
      onOpenChange={onOpenChange}
      title="Fork this configuration"
      description={`Copies ${sourceLabel} into a space where you may write. The fork remembers where it came from.`}
      footer={
        <>
          <Button variant="secondary" onClick={() => onOpenChange(false)}>
            Cancel
          </Button>
          <Button type="submit" form="fork-form" pending={pending} disabled={!groupId}>
            Fork
          </Button>
        </>
      }
    >
      {groups.length === 0 ? (
        <p className="text-muted-foreground">You have no space where you may write.</p>
      ) : (
        <form
          id="fork-form"
          className="grid gap-3"
          onSubmit={(event) => {
            event.preventDefault();
            onFork({ targetGroupId: groupId, title: title.trim() || defaultTitle });
          }}
        >
          <Field id="fork-group" label="Space">
            <SpaceSelect groups={groups} value={groupId} onChange={(event) => setGroupId(event.target.value)} />
          </Field>
          <Field id="fork-title" label="Title" hint="A number is added when the space already has a configuration of this title." error={titleNote ?? error}>
            <Input
              value={title}
              onChange={(event) => {
                const limited = limitText(event.target.value, configurationTitleMaxLength, "Titles");
                setTitle(limited.text);
                setTitleNote(limited.note);
              }}
            />
          </Field>
        </form>
      )}
    </Dialog>
  );
}
