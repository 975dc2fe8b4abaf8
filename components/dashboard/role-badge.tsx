import { Badge, type BadgeVariant } from "@/components/ui/badge";

export type RoleName = "owner" | "editor" | "viewer" | "admin" | "member";

const roleVariants: Record<RoleName, BadgeVariant> = {
  owner: "accent",
  editor: "neutral",
  viewer: "outline",
  admin: "warning",
  member: "outline",
};

/** A group role (owner/editor/viewer) or site role (admin/member) as a badge. */
export function RoleBadge({ role }: { role: RoleName }) {
  return <Badge variant={roleVariants[role]}>{role}</Badge>;
}
