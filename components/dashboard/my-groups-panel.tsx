import Link from "next/link";
import type { Actor } from "@/db/queries/actor";
import { listGroupsForUser } from "@/db/queries/groups";
import { RoleBadge } from "@/components/dashboard/role-badge";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { Skeleton } from "@/components/ui/skeleton";
import { countOf } from "@/lib/wording";

const kindLabels = { personal: "Personal space", research: "Research group", lab: "Lab" } as const;

export async function MyGroupsPanel({ actor }: { actor: Actor }) {
  const groups = await listGroupsForUser(actor);

  return (
    <Card aria-labelledby="my-groups-title">
      <CardHeader>
        <CardTitle id="my-groups-title">My groups</CardTitle>
        <CardDescription>Your personal space and the groups and labs you belong to.</CardDescription>
      </CardHeader>
      <CardContent>
        {groups.length === 0 ? (
          <EmptyState title="No groups yet" description="When someone invites you to a group or lab, it appears here." />
        ) : (
          <ul className="divide-y divide-border rounded-md border border-border">
            {groups.map((group) => (
              <li key={group.id} className="flex items-center gap-3 px-4 py-3">
                <div className="min-w-0 flex-1">
                  <Link href={`/groups/${group.slug}`} className="block truncate font-medium hover:text-accent hover:underline">
                    {group.kind === "personal" ? "My space" : group.name}
                  </Link>
                  <p className="text-xs text-muted-foreground">
                    {kindLabels[group.kind]} · {countOf(group.memberCount, "member")} · {countOf(group.configurationCount, "configuration")}
                  </p>
                </div>
                <RoleBadge role={group.role} />
              </li>
            ))}
          </ul>
        )}
      </CardContent>
    </Card>
  );
}

export function MyGroupsPanelSkeleton() {
  return (
    <Card aria-busy="true" aria-label="Loading your groups">
      <CardHeader>
        <Skeleton className="h-5 w-28" />
        <Skeleton className="h-4 w-64" />
      </CardHeader>
      <CardContent className="grid gap-3">
        {[0, 1, 2].map((row) => (
          <div key={row} className="flex items-center gap-3">
            <div className="grid flex-1 gap-1.5">
              <Skeleton className="h-4 w-40" />
              <Skeleton className="h-3 w-56" />
            </div>
            <Skeleton className="h-5 w-14 rounded-full" />
          </div>
        ))}
      </CardContent>
    </Card>
  );
}
