"use client";

import { useActionState, useId } from "react";
import { changeSiteRoleAction } from "@/app/(workspace)/admin/actions";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import { idleState } from "@/lib/action-state";
import { cn } from "@/lib/utils";

export interface SiteRoleFormProps {
  userId: string;
  userName: string;
  siteRole: "admin" | "member";
}

/** The role cell of the admin users table: a select and a save button, with the result beside it. */
export function SiteRoleForm({ userId, userName, siteRole }: SiteRoleFormProps) {
  const [state, formAction, pending] = useActionState(changeSiteRoleAction, idleState());
  const messageId = useId();
  const problem = state.fieldErrors.siteRole?.[0] ?? state.fieldErrors.userId?.[0] ?? (state.status === "error" ? state.message : null);

  return (
    <form action={formAction} className="grid min-w-52 gap-1">
      <input type="hidden" name="userId" value={userId} />
      <div className="flex items-center gap-2">
        <Select
          name="siteRole"
          defaultValue={siteRole}
          key={siteRole}
          aria-label={`Site role of ${userName}`}
          aria-describedby={messageId}
          aria-invalid={problem ? true : undefined}
          className="h-8 w-32"
        >
          <option value="member">member</option>
          <option value="admin">admin</option>
        </Select>
        <Button type="submit" size="sm" variant="outline" pending={pending}>
          Save
        </Button>
      </div>
      <p id={messageId} role="status" className={cn("text-xs empty:hidden", problem ? "text-danger-soft-foreground" : "text-muted-foreground")}>
        {problem ?? (state.status === "success" ? state.message : null)}
      </p>
    </form>
  );
}
