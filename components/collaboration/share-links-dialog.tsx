"use client";

import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Input } from "@/components/ui/input";
import { Label } from "@/components/ui/label";
import { formatDateTime } from "@/lib/format-date";
import { collaborationQueries, useCreateShareLink, useRevokeShareLink } from "@/lib/client/collaboration";

export interface ShareLinksDialogProps {
  configurationId: string;
}

/**
 * Editors create read-only links and revoke them. A link's URL is shown once, right after it is
 * created (only a digest of its token is stored).
 */
export function ShareLinksDialog({ configurationId }: ShareLinksDialogProps) {
  const [open, setOpen] = useState(false);
  const [freshUrl, setFreshUrl] = useState<string | null>(null);
  const [copied, setCopied] = useState(false);
  const links = useQuery({ ...collaborationQueries.shareLinks(configurationId), enabled: open });
  const create = useCreateShareLink(configurationId);
  const revoke = useRevokeShareLink(configurationId);

  return (
    <>
      <Button variant="outline" onClick={() => setOpen(true)}>
        Share
      </Button>
      <Dialog
        open={open}
        onOpenChange={(next) => {
          setOpen(next);
          if (!next) setFreshUrl(null);
        }}
        title="Share read-only"
        description="Anyone with a link can view this configuration and its stored result without signing in, until the link is revoked."
        footer={
          <Button variant="secondary" onClick={() => setOpen(false)}>
            Close
          </Button>
        }
      >
        <div className="grid gap-4">
          {freshUrl ? (
            <div className="grid gap-1.5">
              <Label htmlFor="share-url">New link (copy it now; it is not shown again)</Label>
              <div className="flex gap-2">
                <Input id="share-url" readOnly value={freshUrl} onFocus={(event) => event.currentTarget.select()} />
                <Button
                  variant="secondary"
                  onClick={async () => {
                    await navigator.clipboard.writeText(freshUrl).catch(() => undefined);
                    setCopied(true);
                  }}
                >
                  {copied ? "Copied" : "Copy"}
                </Button>
              </div>
            </div>
          ) : null}
          {create.error ? <Alert variant="danger">{create.error.message}</Alert> : null}
          {revoke.error ? <Alert variant="danger">{revoke.error.message}</Alert> : null}
          <Button
            onClick={() => {
              setCopied(false);
              create.mutate(undefined, { onSuccess: ({ url }) => setFreshUrl(url) });
            }}
            pending={create.isPending}
          >
            Create a new link
          </Button>
          {links.isPending ? null : links.isError ? (
            <Alert variant="danger">{links.error.message}</Alert>
          ) : links.data.length === 0 ? (
            <p className="text-sm text-muted-foreground">No links yet.</p>
          ) : (
            <ul className="divide-y divide-border rounded-md border border-border text-sm" aria-label="Share links">
              {links.data.map((link) => (
                <li key={link.id} className="flex items-center gap-3 px-3 py-2">
                  <span className="flex-1">
                    Created by {link.createdByName}, {formatDateTime(link.createdAt)}
                    {link.revokedAt ? <span className="text-muted-foreground"> · revoked {formatDateTime(link.revokedAt)}</span> : null}
                  </span>
                  {link.revokedAt ? null : (
                    <Button variant="ghost" size="sm" onClick={() => revoke.mutate(link.id)} aria-label={`Revoke the link created ${formatDateTime(link.createdAt)}`}>
                      Revoke
                    </Button>
                  )}
                </li>
              ))}
            </ul>
          )}
        </div>
      </Dialog>
    </>
  );
}
