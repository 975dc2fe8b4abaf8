import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PageContainer } from "@/components/layout/page-container";
import { Alert } from "@/components/ui/alert";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { Table, TableBody, TableCaption, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import { listAuditLog } from "@/db/queries/audit-log";
import { getGroupBySlug } from "@/db/queries/groups";
import { NotFoundError } from "@/lib/errors";
import { activitySentence } from "@/lib/activity/sentences";
import { formatDateTime } from "@/lib/format-date";
import { requireUser } from "@/lib/server/session";
import { countOf } from "@/lib/wording";
import { BackLink } from "@/components/layout/back-link";

export const metadata: Metadata = { title: "Audit log" };

interface AuditPageProps {
  params: Promise<{ slug: string }>;
  searchParams: Promise<{ before?: string }>;
}

const pageSize = 100;

export default async function AuditPage({ params, searchParams }: AuditPageProps) {
  const { slug } = await params;
  const { before } = await searchParams;
  const actor = await requireUser(`/groups/${slug}/audit`);
  const group = await getGroupBySlug(actor, slug).catch((error: unknown) => {
    if (error instanceof NotFoundError) notFound();
    throw error;
  });
  const back = (
    <BackLink href={`/groups/${group.slug}`}>{group.name}</BackLink>
  );
  if (group.role !== "owner") {
    return (
      <PageContainer className="grid gap-6">
        <PageHeader eyebrow={back} title="Audit log" />
        <Alert variant="warning" title="Owners only">
          The audit log of {group.name} is readable by the group&apos;s owners.
        </Alert>
      </PageContainer>
    );
  }
  const beforeDate = before && !Number.isNaN(Date.parse(before)) ? new Date(before) : undefined;
  const entries = await listAuditLog(actor, group.id, { limit: pageSize, before: beforeDate });
  const last = entries.at(-1);

  return (
    <PageContainer className="grid gap-6">
      <PageHeader eyebrow={back} title="Audit log" description="Every write in this group, newest first." />
      {entries.length === 0 ? (
        <EmptyState title="Nothing recorded yet" />
      ) : (
        <Table>
          <TableCaption>
            {countOf(entries.length, "entry", "entries")}{beforeDate ? ` before ${formatDateTime(beforeDate)}` : ""}.
          </TableCaption>
          <TableHeader>
            <TableRow>
              <TableHead>When</TableHead>
              <TableHead>Who</TableHead>
              <TableHead>What happened</TableHead>
            </TableRow>
          </TableHeader>
          <TableBody>
            {entries.map((entry) => (
              <TableRow key={entry.id}>
                <TableCell className="whitespace-nowrap text-muted-foreground">{formatDateTime(entry.createdAt)}</TableCell>
                <TableCell>{entry.actorName ?? "a deleted account"}</TableCell>
                <TableCell title={entry.action}>
                  {activitySentence(entry, { actor: entry.actorName ?? "A deleted account", configurationTitle: entry.configurationTitle })}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
      {last && entries.length === pageSize ? (
        <Link href={`/groups/${group.slug}/audit?before=${encodeURIComponent(last.createdAt.toISOString())}`} className="text-sm text-accent hover:underline">
          Older entries →
        </Link>
      ) : null}
    </PageContainer>
  );
}
