"use client";

import { useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";

export interface SaveDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  pending: boolean;
  /** Error text of the last failed save. */
  error: string | null;
  onSave: (message: string) => void;
}

/** Asks for a revision message and saves. */
export function SaveDialog({ open, onOpenChange, pending, error, onSave }: SaveDialogProps) {
  const [message, setMessage] = useState("");
  const inputRef = useRef<HTMLInputElement>(null);

  // The dialog focuses its first control when it opens; the message field is the useful one.
  useEffect(() => {
    if (open) inputRef.current?.focus();
  }, [open]);
  return (
    <Dialog
      open={open}
      onOpenChange={onOpenChange}
      title="Save a revision"
      description="Every save is kept as a revision; the server recomputes and stores its spectrum."
      footer={
        <>
          <Button variant="secondary" onClick={() => onOpenChange(false)}>
            Cancel
          </Button>
          <Button type="submit" form="save-revision-form" pending={pending}>
            Save revision
          </Button>
        </>
      }
    >
      <form
        id="save-revision-form"
        onSubmit={(event) => {
          event.preventDefault();
          onSave(message.trim());
        }}
        className="grid gap-3"
      >
        <Field id="revision-message" label="What changed?" hint="Optional, up to 500 characters." error={error}>
          <Input ref={inputRef} value={message} maxLength={500} onChange={(event) => setMessage(event.target.value)} placeholder="e.g. moved the probe to y = 2" />
        </Field>
      </form>
    </Dialog>
  );
}
