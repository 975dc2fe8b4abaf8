import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TableBody, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import type { ForkListItemDto } from "@/db/queries/forks";
import { formatDateTime } from "@/lib/format-date";

export interface ForksListProps {
  /** The configuration the forks were made from. */
  sourceId: string;
  forks: ForkListItemDto[];
}

/**
 * The forks of a configuration, for its author and its group's editors: who forked it, into which
 * space, and a link to each fork and to its comparison with this one where the reader may open it.
 */
export function ForksList({ sourceId, forks }: ForksListProps) {
  if (forks.length === 0) {
    return <EmptyState title="No forks yet" description="When someone forks this configuration, the fork is listed here and in your recent activity." />;
  }
  return (
    <Table aria-label="Forks of this configuration">
      <TableHeader>
        <TableRow>
          <TableHead>Fork</TableHead>
          <TableHead>By</TableHead>
          <TableHead>Space</TableHead>
          <TableHead>Last change</TableHead>
          <TableHead className="text-right">Against this one</TableHead>
        </TableRow>
      </TableHeader>
      <TableBody>
        {forks.map((fork) => (
          <TableRow key={fork.id} data-testid={`fork-${fork.id}`}>
            <TableCell className="font-medium">
              {fork.readable ? (
                <Link href={`/configurations/${fork.id}`} className="text-accent hover:underline">
                  {fork.title}
                </Link>
              ) : (
                <span title="In a space you are not a member of">{fork.title}</span>
              )}
            </TableCell>
            <TableCell>{fork.author.name}</TableCell>
            <TableCell className="text-muted-foreground">{fork.group.kind === "personal" ? `${fork.author.name}\u2019s personal space` : fork.group.name}</TableCell>
            <TableCell className="whitespace-nowrap text-muted-foreground">{formatDateTime(fork.updatedAt)}</TableCell>
            <TableCell className="text-right">
              {fork.readable ? (
                <Link href={`/configurations/${fork.id}/compare?with=${sourceId}`} className="text-accent hover:underline">
                  Compare
                </Link>
              ) : (
                <span className="text-muted-foreground">not shared with you</span>
              )}
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
