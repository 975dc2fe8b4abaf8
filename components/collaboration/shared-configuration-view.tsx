import { LightestStatesTable } from "@/components/results/lightest-states-table";
import { SectorLevelsTable } from "@/components/results/sector-levels-table";
import { SpectrumSummary } from "@/components/results/spectrum-summary";
import { ConventionsNote } from "@/components/designer/conventions-note";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { Table, TableBody, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import type { SharedConfigurationDto } from "@/db/queries/share-links";
import { dimensionOf } from "@/lib/boundary";
import { stackKind } from "@/lib/designer/stack-kind";
import { formatNumber, pairKey, sectorNames, summaryFacts } from "@/lib/spectrum";
import { SectorNameText } from "@/components/results/sector-name-text";

export interface SharedConfigurationViewProps {
  shared: SharedConfigurationDto;
}

/** A read-only view of a shared configuration and its stored result. */
export function SharedConfigurationView({ shared }: SharedConfigurationViewProps) {
  const { document, result } = shared;
  const names = sectorNames(document.stacks);
  const dimension = dimensionOf(document);
  return (
    <div className="grid gap-6">
      <Card aria-labelledby="stacks-title">
        <CardHeader>
          <CardTitle id="stacks-title">Stacks</CardTitle>
          <CardDescription>
            {document.theory}, D = {dimension}; Neumann axes listed, every other spatial axis Dirichlet at the position shown (missing = 0).
          </CardDescription>
        </CardHeader>
        <CardContent>
          <Table>
            <TableHeader>
              <TableRow>
                <TableHead>Stack</TableHead>
                <TableHead>Type</TableHead>
                <TableHead className="text-right">N</TableHead>
                <TableHead>Neumann axes</TableHead>
                <TableHead>Dirichlet positions</TableHead>
              </TableRow>
            </TableHeader>
            <TableBody>
              {document.stacks.map((stack) => (
                <TableRow key={stack.id}>
                  <TableCell className="font-medium">
                    {stack.label || stack.id} <span className="font-mono text-xs text-muted-foreground">({stack.id})</span>
                  </TableCell>
                  <TableCell>{stackKind(stack, document.theory)}</TableCell>
                  <TableCell className="text-right">{stack.count}</TableCell>
                  <TableCell className="font-mono text-xs">{stack.worldvolume.map((axis) => `x${axis}`).join(" ") || "none"}</TableCell>
                  <TableCell className="font-mono text-xs">
                    {Object.entries(stack.position)
                      .filter(([axis, value]) => !stack.worldvolume.includes(Number(axis)) && value !== 0)
                      .map(([axis, value]) => `x${axis} = ${value}`)
                      .join(", ") || "all at 0"}
                  </TableCell>
                </TableRow>
              ))}
            </TableBody>
          </Table>
        </CardContent>
      </Card>

      {result ? (
        <>
          <Card aria-labelledby="summary-title">
            <CardHeader>
              <CardTitle id="summary-title">Spectrum summary</CardTitle>
              <CardDescription>Stored result of revision {shared.revisionNumber}, engine {result.engineVersion}.</CardDescription>
            </CardHeader>
            <CardContent className="grid gap-4 text-sm">
              <SpectrumSummary facts={summaryFacts(result)} stacks={document.stacks} />
              {result.warnings.length > 0 ? (
                <ul className="list-disc pl-5 text-warning-soft-foreground">
                  {result.warnings.map((warning) => (
                    <li key={warning}>{warning}</li>
                  ))}
                </ul>
              ) : null}
              <div className="grid gap-1">
                <h3 className="text-sm font-semibold">Lightest states</h3>
                <LightestStatesTable states={result.lightest} stacks={document.stacks} label="Lightest states over all sectors" />
              </div>
            </CardContent>
          </Card>

          <Card aria-labelledby="sectors-title">
            <CardHeader>
              <CardTitle id="sectors-title">Sectors</CardTitle>
            </CardHeader>
            <CardContent className="grid gap-5">
              {[...result.sectors].sort((a, b) => names.compare(a.pair, b.pair)).map((sector) => (
                <section key={pairKey(...sector.pair)} className="grid gap-2">
                  <h3 className="text-sm font-semibold">
                    <SectorNameText names={names} pair={sector.pair} />{" "}
                    <span className="font-normal text-muted-foreground">
                      ν = {sector.nu}, y = {formatNumber(sector.separation)}, Chan–Paton {sector.chanPaton}
                      {sector.tachyonic ? ", tachyonic" : ""}
                      {sector.supersymmetric ? ", supersymmetric" : ""}
                    </span>
                  </h3>
                  <SectorLevelsTable
                    caption={`Levels of the ${names.sector(sector.pair).text} sector`}
                    rows={sector.levels}
                    zeroPoint={sector.zeroPoint}
                    kind="all"
                    // Every row the engine stored: it already cut them at the document's mass cap.
                    massCap={Number.POSITIVE_INFINITY}
                    showGeV={document.stringScaleGeV !== null}
                  />
                </section>
              ))}
            </CardContent>
          </Card>
        </>
      ) : (
        <p className="text-sm text-muted-foreground">No stored result for this revision.</p>
      )}
      <ConventionsNote full />
    </div>
  );
}
