import Link from "next/link";
import { SupersymmetryBadge, TachyonBadge } from "@/components/collaboration/result-badges";
import { EmptyState } from "@/components/ui/empty-state";
import { Table, TableBody, TableCaption, TableCell, TableHead, TableHeader, TableRow } from "@/components/ui/table";
import type { StarterComparisonDto } from "@/db/queries/labs";
import type { LabSweepDto } from "@/db/queries/sweeps";
import { formatDateTime } from "@/lib/format-date";
import { formatMassSquared } from "@/lib/spectrum";

export interface StarterForksComparisonProps {
  comparison: StarterComparisonDto[];
  /** The students' sweeps, by fork configuration id (db/queries/sweeps.ts `listLabSweeps`). */
  sweeps?: Record<string, LabSweepDto[]>;
}

/** The instructor's view: per starter, each student's fork with its key results side by side. */
export function StarterForksComparison({ comparison, sweeps = {} }: StarterForksComparisonProps) {
  if (comparison.length === 0) {
    return (
      <EmptyState
        title="No starters published"
        description="Publish a configuration as a starter; students fork it into their own space and their forks appear here."
      />
    );
  }
  return (
    <div className="grid gap-6">
      {comparison.map((starter) => (
        <section key={starter.starterId} aria-labelledby={`starter-${starter.starterId}`} className="grid gap-2">
          <h3 id={`starter-${starter.starterId}`} className="text-sm font-semibold">
            <Link href={`/configurations/${starter.starterId}`} className="hover:text-accent hover:underline">
              {starter.title}
            </Link>{" "}
            <span className="font-normal text-muted-foreground">
              · {starter.forks.length === 1 ? "1 fork" : `${starter.forks.length} forks`}
            </span>
          </h3>
          {starter.forks.length === 0 ? (
            <p className="text-sm text-muted-foreground">No student has forked this starter yet.</p>
          ) : (
            <Table>
              <TableCaption>
                Starter: lightest α′M² {formatMassSquared(starter.lightestMassSquared)}, {starter.tachyonic ? "tachyonic" : "stable"}. alpha&apos; = 1.
              </TableCaption>
              <TableHeader>
                <TableRow>
                  <TableHead>Student</TableHead>
                  <TableHead>Fork</TableHead>
                  <TableHead>Supersymmetry</TableHead>
                  <TableHead>Tachyons</TableHead>
                  <TableHead className="text-right">Lightest α′M²</TableHead>
                  <TableHead className="text-right">Revisions</TableHead>
                  <TableHead>Sweeps</TableHead>
                  <TableHead>Last change</TableHead>
                  <TableHead className="text-right">Against the starter</TableHead>
                </TableRow>
              </TableHeader>
              <TableBody>
                {starter.forks.map((fork) => (
                  <TableRow key={fork.configurationId}>
                    <TableCell className="font-medium">{fork.student.name}</TableCell>
                    {/* Forks live in the students' own spaces; the lab's instructors may read them (configuration-access.ts). */}
                    <TableCell>
                      <Link href={`/configurations/${fork.configurationId}`} className="text-accent hover:underline">
                        {fork.title}
                      </Link>
                    </TableCell>
                    <TableCell>
                      <SupersymmetryBadge supercharges={fork.supercharges} />
                    </TableCell>
                    <TableCell>
                      <TachyonBadge tachyonic={fork.tachyonic} />
                    </TableCell>
                    <TableCell className="text-right font-mono">{formatMassSquared(fork.lightestMassSquared)}</TableCell>
                    <TableCell className="text-right">{fork.version}</TableCell>
                    <TableCell>
                      <ForkSweeps sweeps={sweeps[fork.configurationId] ?? []} />
                    </TableCell>
                    <TableCell className="text-muted-foreground">{formatDateTime(fork.updatedAt)}</TableCell>
                    <TableCell className="text-right">
                      <Link
                        href={`/configurations/${fork.configurationId}/compare?with=${starter.starterId}`}
                        className="text-accent hover:underline"
                        aria-label={`Compare ${fork.student.name}'s fork with the starter`}
                      >
                        Compare
                      </Link>
                    </TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          )}
        </section>
      ))}
    </div>
  );
}

/** A fork's sweeps as the instructor sees them: status, progress and how many points were supersymmetric or tachyonic. */
function ForkSweeps({ sweeps }: { sweeps: LabSweepDto[] }) {
  if (sweeps.length === 0) return <span className="text-muted-foreground">none</span>;
  return (
    <ul className="grid gap-0.5 text-xs">
      {sweeps.map((sweep) => (
        <li key={sweep.id}>
          {sweep.title || "Untitled sweep"}: {sweep.status}, {sweep.donePoints}/{sweep.totalPoints} points; {sweep.supersymmetricPoints} supersymmetric,{" "}
          {sweep.tachyonicPoints} tachyonic
        </li>
      ))}
    </ul>
  );
}
