import Link from "next/link";
import { StarterToggle } from "@/components/collaboration/starter-toggle";
import { ForkToSpaceButton } from "@/components/collaboration/fork-to-space-button";
import { SupersymmetryBadge, TachyonBadge } from "@/components/collaboration/result-badges";
import { Badge } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TableBody, TableCaption, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import type { ConfigurationSummaryDto } from "@/db/queries/configuration-dtos";
import { formatDate } from "@/lib/format-date";
import { formatMassSquared } from "@/lib/spectrum";

export interface GroupConfigurationsTableProps {
  configurations: ConfigurationSummaryDto[];
  groupSlug: string;
  /** Lab owners get a starter toggle per row. */
  canPublishStarters: boolean;
  /** Whether starter rows offer "Fork to my space". */
  forkScope: "none" | "starters";
  emptyTitle: string;
  emptyDescription?: string;
  caption: string;
}

/** A group's configurations with their key results (alpha' = 1). */
export function GroupConfigurationsTable({
  configurations,
  groupSlug,
  canPublishStarters,
  forkScope,
  emptyTitle,
  emptyDescription,
  caption,
}: GroupConfigurationsTableProps) {
  if (configurations.length === 0) return <EmptyState title={emptyTitle} description={emptyDescription} />;
  const showActions = canPublishStarters || forkScope !== "none";
  return (
    <Table>
      <TableCaption>{caption} Masses as alpha&apos; M² with alpha&apos; = 1.</TableCaption>
      <TableHeader>
        <TableRow>
          <TableHead>Title</TableHead>
          <TableHead>Theory</TableHead>
          <TableHead className="text-right">Stacks</TableHead>
          <TableHead className="text-right">Lightest α′M²</TableHead>
          <TableHead>Supersymmetry</TableHead>
          <TableHead>Stability</TableHead>
          <TableHead>Updated</TableHead>
          <TableHead>Author</TableHead>
          {showActions ? <TableHead className="text-right">Actions</TableHead> : null}
        </TableRow>
      </TableHeader>
      <TableBody>
        {configurations.map((configuration) => (
          <TableRow key={configuration.id}>
            <TableCell className="font-medium">
              <Link href={`/configurations/${configuration.id}`} className="hover:text-accent hover:underline">
                {configuration.title}
              </Link>
              {configuration.isStarter ? (
                <Badge variant="accent" className="ml-2">
                  starter
                </Badge>
              ) : null}
            </TableCell>
            <TableCell>{configuration.theory}</TableCell>
            <TableCell className="text-right">{configuration.stackCount}</TableCell>
            <TableCell className="text-right font-mono">{formatMassSquared(configuration.lightestMassSquared)}</TableCell>
            <TableCell>
              <SupersymmetryBadge supercharges={configuration.supercharges} />
            </TableCell>
            <TableCell>
              <TachyonBadge tachyonic={configuration.tachyonic} />
            </TableCell>
            <TableCell className="text-muted-foreground">{formatDate(configuration.updatedAt)}</TableCell>
            <TableCell className="text-muted-foreground">{configuration.author.name}</TableCell>
            {showActions ? (
              <TableCell className="text-right">
                <span className="inline-flex gap-2">
                  {forkScope === "starters" && configuration.isStarter ? (
                    <ForkToSpaceButton configurationId={configuration.id} title={configuration.title} />
                  ) : null}
                  {canPublishStarters ? (
                    <StarterToggle
                      configurationId={configuration.id}
                      title={configuration.title}
                      isStarter={configuration.isStarter}
                      groupSlug={groupSlug}
                    />
                  ) : null}
                </span>
              </TableCell>
            ) : null}
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
