import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ForksList } from "@/components/collaboration/forks-list";
import { RestoreRevisionButton } from "@/components/collaboration/restore-revision-button";
import { RevisionDiffView } from "@/components/collaboration/revision-diff-view";
import { PageContainer } from "@/components/layout/page-container";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { Label } from "@/components/ui/label";
import { PageHeader } from "@/components/ui/page-header";
import { Select } from "@/components/ui/select";
import { Table, TableBody, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import { getConfiguration } from "@/db/queries/configurations";
import { type RevisionSummaryDto } from "@/db/queries/configuration-dtos";
import { listForkLinks } from "@/db/queries/forks";
import { getResultForRevision } from "@/db/queries/result-reads";
import { getRevisionByNumber, listRevisions } from "@/db/queries/revisions";
import { NotFoundError } from "@/lib/errors";
import { formatDateTime } from "@/lib/format-date";
import { bothSidesStacks, diffConfigurations, diffInteractions, diffSpectra } from "@/lib/revisions/diff";
import { requireUser } from "@/lib/server/session";
import { BackLink } from "@/components/layout/back-link";

export const metadata: Metadata = { title: "History" };

interface HistoryPageProps {
  params: Promise<{ configurationId: string }>;
  searchParams: Promise<{ from?: string; to?: string }>;
}

export default async function HistoryPage({ params, searchParams }: HistoryPageProps) {
  const { configurationId } = await params;
  const query = await searchParams;
  const actor = await requireUser(`/configurations/${configurationId}/history`);
  const [configuration, revisions] = await Promise.all([
    getConfiguration(actor, configurationId),
    listRevisions(actor, configurationId),
  ]).catch((error: unknown) => {
    if (error instanceof NotFoundError) notFound();
    throw error;
  });

  const numbers = revisions.map((revision) => revision.number);
  const newest = numbers[0] ?? 1;
  const to = pick(query.to, numbers) ?? newest;
  const from = pick(query.from, numbers) ?? numbers.find((number) => number < to) ?? to;
  const comparison = revisions.length > 1 ? await compare(actor, configurationId, from, to, revisions) : null;
  // The author and the group's editors follow the forks; other readers do not see the list.
  const forks = configuration.canEdit || configuration.author.id === actor.id ? await listForkLinks(actor, configurationId) : null;

  return (
    <PageContainer className="grid gap-6">
      <PageHeader
        eyebrow={
          <BackLink href={`/configurations/${configurationId}`}>{configuration.title}</BackLink>
        }
        title="History"
        description="Every save is a revision. Compare any two, or restore an old one as a new revision."
        actions={
          <Link href={`/configurations/${configurationId}/compare`} className="text-sm text-accent hover:underline">
            {configuration.forkedFrom?.title ? "Compare with the source" : "Compare with its forks"}
          </Link>
        }
      />

      <Card aria-labelledby="revisions-title">
        <CardHeader>
          <CardTitle id="revisions-title">Revisions</CardTitle>
          <CardDescription>{revisions.length === 1 ? "1 revision" : `${revisions.length} revisions`}, newest first.</CardDescription>
        </CardHeader>
        <CardContent>
          <Table>
            <TableHeader>
              <TableRow>
                <TableHead className="text-right">#</TableHead>
                <TableHead>Message</TableHead>
                <TableHead>Author</TableHead>
                <TableHead>When</TableHead>
                {configuration.canEdit ? <TableHead className="text-right">Actions</TableHead> : null}
              </TableRow>
            </TableHeader>
            <TableBody>
              {revisions.map((revision) => (
                <TableRow key={revision.id}>
                  <TableCell className="text-right font-mono">{revision.number}</TableCell>
                  <TableCell>
                    {revision.message || <span className="text-muted-foreground">No message</span>}
                    {revision.isCurrent ? (
                      <Badge variant="accent" className="ml-2">
                        current
                      </Badge>
                    ) : null}
                  </TableCell>
                  <TableCell>{revision.author.name}</TableCell>
                  <TableCell className="whitespace-nowrap text-muted-foreground">{formatDateTime(revision.createdAt)}</TableCell>
                  {configuration.canEdit ? (
                    <TableCell className="text-right">
                      {revision.isCurrent ? null : (
                        <RestoreRevisionButton
                          configurationId={configurationId}
                          revisionId={revision.id}
                          revisionNumber={revision.number}
                          currentVersion={configuration.version}
                        />
                      )}
                    </TableCell>
                  ) : null}
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </CardContent>
      </Card>

      {forks ? (
        <Card aria-labelledby="forks-title">
          <CardHeader>
            <CardTitle id="forks-title">Forks</CardTitle>
            <CardDescription>
              {forks.length === 1 ? "1 fork" : `${forks.length} forks`} made from this configuration, newest change first.
            </CardDescription>
          </CardHeader>
          <CardContent>
            <ForksList sourceId={configurationId} forks={forks} />
          </CardContent>
        </Card>
      ) : null}

      {revisions.length > 1 ? (
        <Card aria-labelledby="compare-title">
          <CardHeader>
            <CardTitle id="compare-title">Compare two revisions</CardTitle>
          </CardHeader>
          <CardContent className="grid gap-5">
            <form method="get" className="flex flex-wrap items-end gap-3">
              <RevisionSelect id="from" label="From" value={from} revisions={revisions} />
              <RevisionSelect id="to" label="To" value={to} revisions={revisions} />
              <Button type="submit" variant="secondary">
                Compare
              </Button>
            </form>
            {comparison ? <RevisionDiffView fromNumber={from} toNumber={to} {...comparison} /> : null}
          </CardContent>
        </Card>
      ) : null}
    </PageContainer>
  );
}

function RevisionSelect({ id, label, value, revisions }: { id: string; label: string; value: number; revisions: RevisionSummaryDto[] }) {
  return (
    <div className="grid gap-1.5">
      <Label htmlFor={id}>{label}</Label>
      <Select id={id} name={id} defaultValue={String(value)} className="w-64">
        {revisions.map((revision) => (
          <option key={revision.id} value={revision.number}>
            {revision.number}: {revision.message.slice(0, 40) || "no message"}
          </option>
        ))}
      </Select>
    </div>
  );
}

function pick(value: string | undefined, numbers: number[]): number | undefined {
  const number = Number(value);
  return Number.isInteger(number) && numbers.includes(number) ? number : undefined;
}

async function compare(
  actor: Awaited<ReturnType<typeof requireUser>>,
  configurationId: string,
  from: number,
  to: number,
  revisions: RevisionSummaryDto[],
) {
  const [before, after] = await Promise.all([
    getRevisionByNumber(actor, configurationId, from),
    getRevisionByNumber(actor, configurationId, to),
  ]);
  const withResult = (number: number) => revisions.find((revision) => revision.number === number)?.hasResult ?? false;
  const [beforeResult, afterResult] =
    withResult(from) && withResult(to)
      ? await Promise.all([getResultForRevision(actor, before.id), getResultForRevision(actor, after.id)])
      : [null, null];
  return {
    stacks: bothSidesStacks(before.document, after.document),
    configurationDiff: diffConfigurations(before.document, after.document),
    spectrumDiff: beforeResult && afterResult ? diffSpectra(beforeResult.result, afterResult.result) : null,
    potentialChanges: diffInteractions(before.document, after.document),
  };
}
