import Link from "next/link";
import type { Actor } from "@/db/queries/actor";
import { listRecentActivityForUser, type ActivityDto } from "@/db/queries/auth";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { Skeleton } from "@/components/ui/skeleton";
import { capitalise, describeActivity } from "@/lib/activity/sentences";
import { formatDateTime } from "@/lib/format-date";

/** What the signed-in user did lately, in the groups they belong to. */
export async function RecentActivityPanel({ actor }: { actor: Actor }) {
  const entries = await listRecentActivityForUser(actor, { limit: 8 });

  return (
    <Card aria-labelledby="recent-activity-title">
      <CardHeader>
        <CardTitle id="recent-activity-title">Recent activity</CardTitle>
        <CardDescription>Your latest changes across your groups, and forks others made of your configurations.</CardDescription>
      </CardHeader>
      <CardContent>
        {entries.length === 0 ? (
          <EmptyState title="Nothing yet" description="Saves, forks, comments and invitations you make will be listed here." />
        ) : (
          <ol className="grid gap-3">
            {entries.map((entry) => (
              <li key={entry.id} className="grid gap-0.5 text-sm">
                <ActivityLine entry={entry} />
                <time dateTime={entry.createdAt.toISOString()} className="text-xs text-muted-foreground tabular">
                  {formatDateTime(entry.createdAt)}
                </time>
              </li>
            ))}
          </ol>
        )}
      </CardContent>
    </Card>
  );
}

function ActivityLine({ entry }: { entry: ActivityDto }) {
  const phrase = describeActivity(entry);
  const groupLabel = entry.group.kind === "personal" ? "your personal space" : entry.group.name;
  const deletedTitle = typeof entry.details.title === "string" ? `“${entry.details.title}”` : "a configuration";
  return (
    <p data-testid={entry.otherActorName ? "activity-by-other" : undefined}>
      {entry.otherActorName ? `${entry.otherActorName} ${phrase.verb}` : capitalise(phrase.verb)}{" "}
      {phrase.aboutConfiguration ? (
        entry.configuration ? (
          <Link href={`/configurations/${entry.configuration.id}`} className="font-medium hover:text-accent hover:underline">
            {entry.configuration.title}
          </Link>
        ) : (
          deletedTitle
        )
      ) : null}
      {phrase.rest ? ` ${phrase.rest}` : null}{" "}
      <span className="text-muted-foreground">
        in{" "}
        <Link href={`/groups/${entry.group.slug}`} className="hover:text-accent hover:underline">
          {groupLabel}
        </Link>
      </span>
      .
    </p>
  );
}

export function RecentActivityPanelSkeleton() {
  return (
    <Card aria-busy="true" aria-label="Loading your recent activity">
      <CardHeader>
        <Skeleton className="h-5 w-32" />
        <Skeleton className="h-4 w-52" />
      </CardHeader>
      <CardContent className="grid gap-3">
        {[0, 1, 2].map((row) => (
          <div key={row} className="grid gap-1.5">
            <Skeleton className="h-4 w-56" />
            <Skeleton className="h-3 w-32" />
          </div>
        ))}
      </CardContent>
    </Card>
  );
}
