"use client";

import { useQuery } from "@tanstack/react-query";
import { useState, type FormEvent } from "react";
import { Alert } from "@/components/ui/alert";
import { Badge, type BadgeVariant } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { Table, TableBody, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import type { GroupRole } from "@/db/schema";
import { formatDateTime } from "@/lib/format-date";
import { ApiError } from "@/lib/client/api-client";
import {
  collaborationQueries,
  useInvite,
  useResendInvitation,
  useRevokeInvitation,
  type InvitationJson,
} from "@/lib/client/collaboration";

export interface InvitationsPanelProps {
  groupId: string;
  initialInvitations: InvitationJson[];
}

const statusVariants: Record<InvitationJson["status"], BadgeVariant> = {
  pending: "accent",
  accepted: "success",
  revoked: "outline",
  expired: "warning",
};

/** Owners invite people by e-mail, and resend or revoke pending invitations. */
export function InvitationsPanel({ groupId, initialInvitations }: InvitationsPanelProps) {
  const { data: invitations = initialInvitations } = useQuery({
    ...collaborationQueries.invitations(groupId),
    initialData: initialInvitations,
  });
  const invite = useInvite(groupId);
  const resend = useResendInvitation(groupId);
  const revoke = useRevokeInvitation(groupId);
  const [email, setEmail] = useState("");
  const [role, setRole] = useState<GroupRole>("editor");
  const [notice, setNotice] = useState<{ variant: "success" | "warning" | "danger"; text: string } | null>(null);
  const emailError = invite.error instanceof ApiError ? invite.error.issues.find((issue) => issue.path[0] === "email")?.message : undefined;

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setNotice(null);
    invite.mutate(
      { email, role },
      {
        onSuccess: ({ invitation, mailSent }) => {
          setEmail("");
          setNotice(
            mailSent
              ? { variant: "success", text: `Invitation sent to ${invitation.email}.` }
              : { variant: "warning", text: `The invitation to ${invitation.email} was saved, but the e-mail could not be sent. Try “Resend”.` },
          );
        },
        onError: (error) => {
          if (!(error instanceof ApiError && error.issues.some((issue) => issue.path[0] === "email"))) {
            setNotice({ variant: "danger", text: error.message });
          }
        },
      },
    );
  }

  function onResend(invitation: InvitationJson) {
    setNotice(null);
    resend.mutate(invitation.id, {
      onSuccess: ({ mailSent }) =>
        setNotice(mailSent ? { variant: "success", text: `A new link was sent to ${invitation.email}.` } : { variant: "warning", text: "The e-mail could not be sent." }),
      onError: (error) => setNotice({ variant: "danger", text: error.message }),
    });
  }

  function onRevoke(invitation: InvitationJson) {
    if (!window.confirm(`Revoke the invitation to ${invitation.email}? Its link will stop working.`)) return;
    setNotice(null);
    revoke.mutate(invitation.id, { onError: (error) => setNotice({ variant: "danger", text: error.message }) });
  }

  return (
    <div className="grid gap-4">
      <form onSubmit={onSubmit} noValidate className="grid gap-3 sm:grid-cols-[minmax(0,1fr)_10rem_auto] sm:items-end">
        <Field id="invite-email" label="E-mail address" error={emailError}>
          <Input type="email" value={email} onChange={(event) => setEmail(event.target.value)} placeholder="colleague@university.edu" required />
        </Field>
        <Field id="invite-role" label="Role">
          <Select value={role} onChange={(event) => setRole(event.target.value as GroupRole)}>
            <option value="viewer">viewer</option>
            <option value="editor">editor</option>
            <option value="owner">owner</option>
          </Select>
        </Field>
        <Button type="submit" pending={invite.isPending} className="sm:mb-5">
          Send invitation
        </Button>
      </form>
      {notice ? <Alert variant={notice.variant}>{notice.text}</Alert> : null}
      {invitations.length === 0 ? (
        <p className="text-sm text-muted-foreground">No invitations yet. Invitations expire after 7 days.</p>
      ) : (
        <Table>
          <TableHeader>
            <TableRow>
              <TableHead>E-mail</TableHead>
              <TableHead>Role</TableHead>
              <TableHead>Status</TableHead>
              <TableHead>Expires</TableHead>
              <TableHead className="text-right">Actions</TableHead>
            </TableRow>
          </TableHeader>
          <TableBody>
            {invitations.map((invitation) => (
              <TableRow key={invitation.id}>
                <TableCell>{invitation.email}</TableCell>
                <TableCell>{invitation.role}</TableCell>
                <TableCell>
                  <Badge variant={statusVariants[invitation.status]}>{invitation.status}</Badge>
                </TableCell>
                <TableCell className="text-muted-foreground">{invitation.status === "pending" ? formatDateTime(invitation.expiresAt) : "—"}</TableCell>
                <TableCell className="text-right">
                  {invitation.status === "pending" || invitation.status === "expired" ? (
                    <Button variant="ghost" size="sm" onClick={() => onResend(invitation)} aria-label={`Resend the invitation to ${invitation.email}`}>
                      Resend
                    </Button>
                  ) : null}
                  {invitation.status === "pending" ? (
                    <Button variant="ghost" size="sm" onClick={() => onRevoke(invitation)} aria-label={`Revoke the invitation to ${invitation.email}`}>
                      Revoke
                    </Button>
                  ) : null}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </div>
  );
}
