"use client";

import { useQuery } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { RoleBadge } from "@/components/dashboard/role-badge";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import { Table, TableBody, TableCaption, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import type { GroupRole } from "@/db/schema";
import { collaborationQueries, useChangeMemberRole, useRemoveMember, type MemberJson } from "@/lib/client/collaboration";
import { formatDate } from "@/lib/format-date";

export interface MembersTableProps {
  groupId: string;
  groupName: string;
  myUserId: string;
  myRole: GroupRole;
  /** Personal spaces have one member and nothing to change. */
  personal: boolean;
  initialMembers: MemberJson[];
}

const roles: GroupRole[] = ["owner", "editor", "viewer"];

/** The members of a group with their roles; owners change roles and remove members, anyone may leave. */
export function MembersTable({ groupId, groupName, myUserId, myRole, personal, initialMembers }: MembersTableProps) {
  const router = useRouter();
  const { data: members = initialMembers } = useQuery({ ...collaborationQueries.members(groupId), initialData: initialMembers });
  const changeRole = useChangeMemberRole(groupId);
  const remove = useRemoveMember(groupId);
  const [error, setError] = useState<string | null>(null);
  const isOwner = myRole === "owner" && !personal;

  function onRoleChange(member: MemberJson, role: GroupRole) {
    setError(null);
    changeRole.mutate({ userId: member.userId, role }, { onError: (e) => setError(e.message) });
  }

  function onRemove(member: MemberJson) {
    const leaving = member.userId === myUserId;
    const question = leaving ? `Leave ${groupName}? You will lose access to its configurations.` : `Remove ${member.name} from ${groupName}?`;
    if (!window.confirm(question)) return;
    setError(null);
    remove.mutate(member.userId, {
      onError: (e) => setError(e.message),
      onSuccess: () => {
        if (leaving) router.push("/dashboard");
      },
    });
  }

  return (
    <div className="grid gap-3">
      {error ? <Alert variant="danger">{error}</Alert> : null}
      <Table>
        <TableCaption>{members.length === 1 ? "1 member" : `${members.length} members`}</TableCaption>
        <TableHeader>
          <TableRow>
            <TableHead>Name</TableHead>
            <TableHead>E-mail</TableHead>
            <TableHead>Role</TableHead>
            <TableHead>Joined</TableHead>
            {personal ? null : <TableHead className="text-right">Actions</TableHead>}
          </TableRow>
        </TableHeader>
        <TableBody>
          {members.map((member) => (
            <TableRow key={member.userId}>
              <TableCell className="font-medium">
                {member.name}
                {member.userId === myUserId ? <span className="ml-1 text-xs text-muted-foreground">(you)</span> : null}
              </TableCell>
              <TableCell className="text-muted-foreground">{member.email}</TableCell>
              <TableCell>
                {isOwner ? (
                  <Select
                    aria-label={`Role of ${member.name}`}
                    value={member.role}
                    disabled={changeRole.isPending}
                    onChange={(event) => onRoleChange(member, event.target.value as GroupRole)}
                    className="w-32"
                  >
                    {roles.map((role) => (
                      <option key={role} value={role}>
                        {role}
                      </option>
                    ))}
                  </Select>
                ) : (
                  <RoleBadge role={member.role} />
                )}
              </TableCell>
              <TableCell className="text-muted-foreground">{formatDate(member.joinedAt)}</TableCell>
              {personal ? null : (
                <TableCell className="text-right">
                  {member.userId === myUserId ? (
                    <Button variant="ghost" size="sm" onClick={() => onRemove(member)} pending={remove.isPending}>
                      Leave group
                    </Button>
                  ) : isOwner ? (
                    <Button variant="ghost" size="sm" onClick={() => onRemove(member)} aria-label={`Remove ${member.name}`}>
                      Remove
                    </Button>
                  ) : null}
                </TableCell>
              )}
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </div>
  );
}
