import type { Actor } from "@/db/queries/actor";
import { listConfigurationsForUser } from "@/db/queries/configurations";
import { ButtonLink } from "@/components/ui/button";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { toJson } from "@/lib/client/api-client";
import { ConfigurationTable } from "./configuration-table";

export interface ConfigurationsPanelProps {
  actor: Actor;
  pageSize?: number;
}

/** The dashboard's configurations card: every configuration the user can open, in a searchable table. */
export async function ConfigurationsPanel({ actor, pageSize = 10 }: ConfigurationsPanelProps) {
  const first = await listConfigurationsForUser(actor, { scope: "accessible", sort: "updated", direction: "desc", limit: pageSize });
  return (
    <Card aria-labelledby="configurations-panel-title">
      <CardHeader className="flex flex-row items-start justify-between gap-4">
        <div>
          <CardTitle id="configurations-panel-title">My configurations</CardTitle>
          <CardDescription>In your personal space and your groups, most recently changed first.</CardDescription>
        </div>
        <ButtonLink href="/configurations/new" size="sm">
          New configuration
        </ButtonLink>
      </CardHeader>
      <CardContent>
        <ConfigurationTable
          label="My configurations"
          pageSize={pageSize}
          initialData={{ ...toJson(first), page: 1, pageSize }}
          emptyMessage="No configurations yet. Create one and place a few stacks; the spectrum updates as you edit."
        />
      </CardContent>
    </Card>
  );
}
