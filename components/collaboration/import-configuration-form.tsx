"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { type ConfigurationJson } from "@/lib/client/configurations";
import { ApiError, apiFetch } from "@/lib/client/api-client";
import { formatJsonPath } from "@/lib/errors";
import { importMaxBytes } from "@/lib/validations/import";

export interface ImportConfigurationFormProps {
  /** Spaces where the user may create configurations. */
  spaces: { id: string; name: string }[];
  initialGroupId: string;
}

/** Uploads a configuration file; on success opens it, otherwise lists every problem with its JSON path. */
export function ImportConfigurationForm({ spaces, initialGroupId }: ImportConfigurationFormProps) {
  const router = useRouter();
  const [groupId, setGroupId] = useState(initialGroupId);
  const [file, setFile] = useState<File | null>(null);
  const [localError, setLocalError] = useState<string | null>(null);
  const upload = useMutation({
    mutationFn: (input: { file: File; groupId: string }) => {
      const form = new FormData();
      form.set("file", input.file);
      if (input.groupId) form.set("groupId", input.groupId);
      return apiFetch<ConfigurationJson>("/api/configurations/import", { method: "POST", body: form });
    },
    onSuccess: (created) => router.push(`/configurations/${created.id}`),
  });

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setLocalError(null);
    if (!file) {
      setLocalError("Choose a file first.");
      return;
    }
    if (file.size > importMaxBytes) {
      setLocalError(`${file.name} is larger than 256 kB.`);
      return;
    }
    upload.mutate({ file, groupId });
  }

  const issues = upload.error instanceof ApiError ? upload.error.issues : [];
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4">
      <Field id="import-file" label="Configuration file" hint="A .json file exported from Mooring or written by hand." error={localError}>
        <Input
          type="file"
          accept="application/json,.json"
          className="py-1.5"
          onChange={(event) => {
            setFile(event.target.files?.[0] ?? null);
            upload.reset();
          }}
        />
      </Field>
      <Field id="import-group" label="Save into">
        <Select value={groupId} onChange={(event) => setGroupId(event.target.value)}>
          {spaces.map((space) => (
            <option key={space.id} value={space.id}>
              {space.name}
            </option>
          ))}
        </Select>
      </Field>
      {upload.error ? (
        <Alert variant="danger" title={issues.length > 0 ? `The file has ${issues.length === 1 ? "1 problem" : `${issues.length} problems`}; nothing was saved` : "The file could not be imported"}>
          {issues.length > 0 ? (
            <ul className="mt-1 grid gap-1" aria-label="Problems in the file">
              {issues.map((issue, index) => (
                <li key={`${index}-${issue.path.join(".")}`}>
                  <code className="rounded bg-surface px-1 font-mono text-xs">{formatJsonPath(issue.path) || "(whole file)"}</code> {issue.message}
                </li>
              ))}
            </ul>
          ) : (
            upload.error.message
          )}
        </Alert>
      ) : null}
      <div className="flex justify-end">
        <Button type="submit" pending={upload.isPending}>
          Import
        </Button>
      </div>
    </form>
  );
}
