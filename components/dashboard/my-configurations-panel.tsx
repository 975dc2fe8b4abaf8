import Link from "next/link";
import type { Actor } from "@/db/queries/actor";
import { listConfigurationsForUser } from "@/db/queries/configurations";
import { Badge } from "@/components/ui/badge";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { Skeleton } from "@/components/ui/skeleton";
import { formatDate } from "@/lib/format-date";

const shownCount = 8;

/** The configurations the user created, most recently changed first. */
export async function MyConfigurationsPanel({ actor }: { actor: Actor }) {
  const { items, total } = await listConfigurationsForUser(actor, { scope: "created", sort: "updated", direction: "desc", limit: shownCount });

  return (
    <Card aria-labelledby="my-configurations-title">
      <CardHeader>
        <CardTitle id="my-configurations-title">My configurations</CardTitle>
        <CardDescription>
          {total > items.length ? `The ${items.length} most recently changed of ${total}.` : "Configurations you created, most recently changed first."}
        </CardDescription>
      </CardHeader>
      <CardContent>
        {items.length === 0 ? (
          <EmptyState
            title="No configurations yet"
            description="Place a few stacks on the canvas and Mooring computes their open-string spectrum as you edit."
          />
        ) : (
          <ul className="divide-y divide-border rounded-md border border-border">
            {items.map((item) => (
              <li key={item.id} className="flex flex-col gap-1.5 px-4 py-3 sm:flex-row sm:items-center sm:gap-4">
                <div className="min-w-0 flex-1">
                  <Link href={`/configurations/${item.id}`} className="block truncate font-medium hover:text-accent hover:underline">
                    {item.title}
                  </Link>
                  <p className="text-xs text-muted-foreground">
                    {item.group.kind === "personal" ? "My space" : item.group.name} · {item.stackCount} stack{item.stackCount === 1 ? "" : "s"} ·
                    updated {formatDate(item.updatedAt)}
                  </p>
                </div>
                <div className="flex flex-wrap items-center gap-1.5">
                  <Badge variant="outline">{item.theory}</Badge>
                  {item.tachyonic ? <Badge variant="warning">tachyon</Badge> : null}
                  {item.supercharges !== null && item.supercharges > 0 ? <Badge variant="success">{item.supercharges} supercharges</Badge> : null}
                  {item.lightestMassSquared !== null ? (
                    <span className="font-mono text-xs text-muted-foreground tabular" title="alpha' M² of the lightest state">
                      α′M² = {formatMassSquared(item.lightestMassSquared)}
                    </span>
                  ) : null}
                </div>
              </li>
            ))}
          </ul>
        )}
      </CardContent>
    </Card>
  );
}

export function MyConfigurationsPanelSkeleton() {
  return (
    <Card aria-busy="true" aria-label="Loading your configurations">
      <CardHeader>
        <Skeleton className="h-5 w-40" />
        <Skeleton className="h-4 w-72" />
      </CardHeader>
      <CardContent className="grid gap-3">
        {[0, 1, 2, 3].map((row) => (
          <div key={row} className="flex items-center gap-3">
            <div className="grid flex-1 gap-1.5">
              <Skeleton className="h-4 w-52" />
              <Skeleton className="h-3 w-64" />
            </div>
            <Skeleton className="h-5 w-24 rounded-full" />
          </div>
        ))}
      </CardContent>
    </Card>
  );
}

function formatMassSquared(value: number): string {
  return Number.isInteger(value) ? String(value) : value.toFixed(3).replace(/0+$/, "");
}
