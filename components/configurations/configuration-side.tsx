import Link from "next/link";
import type { Configuration, SpectrumResult } from "@/lib/boundary/types";
import { stackKind } from "@/lib/designer/stack-kind";
import { formatNumber, summaryFacts } from "@/lib/spectrum";
import { LightestStatesTable } from "@/components/results/lightest-states-table";
import { SpectrumSummary } from "@/components/results/spectrum-summary";
import { Badge } from "@/components/ui/badge";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { Table, TableBody, TableCaption, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";

export interface ConfigurationSideProps {
  /** "This fork", "The source": what the side is in the comparison. */
  role: string;
  id: string;
  title: string;
  version: number;
  spaceName: string;
  authorName: string;
  document: Configuration;
  result: SpectrumResult;
  /** Stack ids that differ from the other side (changed, or only on this side). */
  differing: ReadonlyMap<string, "changed" | "only here">;
}

/** One side of a side-by-side comparison: the document's stacks and its spectrum's headline. */
export function ConfigurationSide({ role, id, title, version, spaceName, authorName, document, result, differing }: ConfigurationSideProps) {
  const headingId = `side-${id}`;
  return (
    <Card aria-labelledby={headingId} className="min-w-0">
      <CardHeader>
        <p className="text-xs font-medium text-muted-foreground">{role}</p>
        <CardTitle id={headingId}>
          <Link href={`/configurations/${id}`} className="hover:text-accent hover:underline">
            {title}
          </Link>
        </CardTitle>
        <CardDescription>
          Version {version} in {spaceName}, by {authorName}. {document.theory}, levels up to {document.levels}, string scale{" "}
          {document.stringScaleGeV === null ? "none (string units)" : `${formatNumber(document.stringScaleGeV)} GeV`}.
        </CardDescription>
      </CardHeader>
      <CardContent className="grid gap-4">
        <div className="overflow-x-auto">
          <Table>
            <TableCaption>Stacks of {title}</TableCaption>
            <TableHeader>
              <TableRow>
                <TableHead>Id</TableHead>
                <TableHead>Label</TableHead>
                <TableHead>Type</TableHead>
                <TableHead className="text-right">N</TableHead>
                <TableHead>Neumann axes</TableHead>
                <TableHead>Position (Dirichlet axes)</TableHead>
              </TableRow>
            </TableHeader>
            <TableBody>
              {document.stacks.map((stack) => {
                const difference = differing.get(stack.id);
                return (
                  <TableRow key={stack.id} className={difference ? "bg-warning-soft/40" : undefined}>
                    <TableCell className="font-mono">
                      {stack.id}
                      {difference ? (
                        <Badge variant={difference === "changed" ? "warning" : "accent"} className="ml-2">
                          {difference}
                        </Badge>
                      ) : null}
                    </TableCell>
                    <TableCell>{stack.label}</TableCell>
                    <TableCell className="font-mono whitespace-nowrap">{stackKind(stack, document.theory)}</TableCell>
                    <TableCell className="text-right font-mono">{stack.count}</TableCell>
                    <TableCell className="font-mono">{stack.worldvolume.length === 0 ? "none" : stack.worldvolume.map((axis) => `x${axis}`).join(" ")}</TableCell>
                    <TableCell className="font-mono text-xs">
                      {Object.entries(stack.position)
                        .filter(([, value]) => value !== 0)
                        .map(([axis, value]) => `x${axis} = ${formatNumber(value)}`)
                        .join(", ") || "at the origin"}
                    </TableCell>
                  </TableRow>
                );
              })}
            </TableBody>
          </Table>
        </div>
        <SpectrumSummary facts={summaryFacts(result)} stacks={document.stacks} />
        <LightestStatesTable states={result.lightest.slice(0, 6)} stacks={document.stacks} label={`Lightest states of ${title}`} compact stringScaleGeV={document.stringScaleGeV} />
      </CardContent>
    </Card>
  );
}
