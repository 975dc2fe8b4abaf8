"use client";

import { useState, useTransition } from "react";
import { revokeApiTokenAction } from "@/app/(workspace)/account/actions";
import type { ApiTokenDto } from "@/db/queries/api-tokens";
import { Alert } from "@/components/ui/alert";
import { Badge, type BadgeVariant } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Table, TableBody, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import { formatDate, formatDateTime } from "@/lib/format-date";

/** One token as the account page lists it (never its secret), with its status when the page was rendered. */
export type ApiTokenListItem = ApiTokenDto & { status: "live" | "expired" | "revoked" };

export interface ApiTokenListProps {
  tokens: ApiTokenListItem[];
}

const statusBadge: Record<ApiTokenListItem["status"], { label: string; variant: BadgeVariant }> = {
  live: { label: "Live", variant: "success" },
  expired: { label: "Expired", variant: "neutral" },
  revoked: { label: "Revoked", variant: "neutral" },
};

/** The account's API tokens with their scope, dates and status; a live token can be revoked after a confirmation. */
export function ApiTokenList({ tokens }: ApiTokenListProps) {
  const [confirming, setConfirming] = useState<ApiTokenListItem | null>(null);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, startTransition] = useTransition();

  if (tokens.length === 0) {
    return <p className="text-sm text-muted-foreground">No tokens yet. Create one for each script or machine, so each can be revoked on its own.</p>;
  }
  return (
    <div className="grid gap-3">
      {message ? <Alert variant={message.ok ? "success" : "danger"}>{message.text}</Alert> : null}
      <Table aria-label="API tokens">
        <TableHeader>
          <TableRow>
            <TableHead>Name</TableHead>
            <TableHead>Access</TableHead>
            <TableHead>Token</TableHead>
            <TableHead>Created</TableHead>
            <TableHead>Expires</TableHead>
            <TableHead>Last used</TableHead>
            <TableHead>Status</TableHead>
            <TableHead>
              <span className="sr-only">Actions</span>
            </TableHead>
          </TableRow>
        </TableHeader>
        <TableBody>
          {tokens.map((token) => (
            <TableRow key={token.id}>
              <TableCell className="font-medium">{token.name}</TableCell>
              <TableCell>{token.scope === "write" ? "Read and write" : "Read only"}</TableCell>
              <TableCell className="font-mono text-xs whitespace-nowrap">{token.hint}…</TableCell>
              <TableCell className="whitespace-nowrap">{formatDate(token.createdAt)}</TableCell>
              <TableCell className="whitespace-nowrap">{formatDate(token.expiresAt)}</TableCell>
              <TableCell className="whitespace-nowrap">{token.lastUsedAt ? formatDateTime(token.lastUsedAt) : "Never"}</TableCell>
              <TableCell>
                <Badge variant={statusBadge[token.status].variant}>{statusBadge[token.status].label}</Badge>
              </TableCell>
              <TableCell className="text-right">
                {token.status === "live" ? (
                  <Button variant="ghost" size="sm" aria-label={`Revoke the token ${token.name}`} onClick={() => setConfirming(token)}>
                    Revoke
                  </Button>
                ) : null}
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
      <Dialog
        open={confirming !== null}
        onOpenChange={(open) => {
          if (!open) setConfirming(null);
        }}
        title={`Revoke "${confirming?.name ?? ""}"?`}
        description="Scripts using this token are refused from their next request on. This cannot be undone; create a new token if you need one again."
        footer={
          <>
            <Button variant="secondary" onClick={() => setConfirming(null)}>
              Keep it
            </Button>
            <Button
              variant="danger"
              pending={pending}
              onClick={() => {
                const token = confirming;
                if (!token) return;
                startTransition(async () => {
                  const result = await revokeApiTokenAction(token.id);
                  setMessage({ ok: result.status === "success", text: result.message ?? "" });
                  setConfirming(null);
                });
              }}
            >
              Revoke token
            </Button>
          </>
        }
      />
    </div>
  );
}
