"use client";

import { useQuery } from "@tanstack/react-query";
import { useRef, useState, type ChangeEvent } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Skeleton } from "@/components/ui/skeleton";
import { formatDateTime } from "@/lib/format-date";
import { collaborationQueries, useDeleteAttachment, useUploadAttachment } from "@/lib/client/collaboration";
import { attachmentMaxBytes } from "@/lib/validations/attachment";

export interface AttachmentsPanelProps {
  configurationId: string;
  /** Editors and owners upload and delete; everyone else only downloads. */
  canEdit: boolean;
}

/** Figures and notes (PNG, JPEG, PDF up to 5 MB) kept with a configuration; members download them. */
export function AttachmentsPanel({ configurationId, canEdit }: AttachmentsPanelProps) {
  const attachments = useQuery(collaborationQueries.attachments(configurationId));
  const upload = useUploadAttachment(configurationId);
  const remove = useDeleteAttachment(configurationId);
  const input = useRef<HTMLInputElement>(null);
  const [localError, setLocalError] = useState<string | null>(null);

  function onChoose(event: ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    event.target.value = "";
    setLocalError(null);
    if (!file) return;
    // The server checks again from the bytes; this only spares a useless upload.
    if (file.size > attachmentMaxBytes) {
      setLocalError(`${file.name} is larger than 5 MB.`);
      return;
    }
    upload.mutate(file);
  }

  const error = localError ?? upload.error?.message ?? remove.error?.message ?? null;
  return (
    <section aria-labelledby="attachments-title" className="grid gap-3">
      <div className="flex items-center justify-between gap-2">
        <h2 id="attachments-title" className="text-base font-semibold">
          Attachments
        </h2>
        {canEdit ? (
          <>
            <input ref={input} type="file" accept="image/png,image/jpeg,application/pdf" className="sr-only" aria-label="Attach a file" onChange={onChoose} />
            <Button variant="secondary" size="sm" pending={upload.isPending} onClick={() => input.current?.click()}>
              Attach a file
            </Button>
          </>
        ) : null}
      </div>
      {error ? <Alert variant="danger">{error}</Alert> : null}
      {attachments.isPending ? (
        <Skeleton className="h-10 w-full" />
      ) : attachments.isError ? (
        <Alert variant="danger">{attachments.error.message}</Alert>
      ) : attachments.data.length === 0 ? (
        <p className="text-sm text-muted-foreground">No figures or notes yet. PNG, JPEG or PDF, up to 5 MB each.</p>
      ) : (
        <ul className="divide-y divide-border rounded-md border border-border text-sm">
          {attachments.data.map((attachment) => (
            <li key={attachment.id} className="flex items-center gap-3 px-3 py-2">
              <a href={`/api/attachments/${attachment.id}`} className="min-w-0 flex-1 truncate font-medium text-accent hover:underline">
                {attachment.fileName}
              </a>
              <span className="text-xs text-muted-foreground">
                {formatSize(attachment.byteSize)} · {attachment.uploadedByName} · {formatDateTime(attachment.createdAt)}
              </span>
              {canEdit ? (
                <Button
                  variant="ghost"
                  size="sm"
                  aria-label={`Delete ${attachment.fileName}`}
                  onClick={() => {
                    if (window.confirm(`Delete ${attachment.fileName}?`)) remove.mutate(attachment.id);
                  }}
                >
                  Delete
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

function formatSize(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${(bytes / (1024 * 1024)).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} kB`;
}
