import type { WorldvolumeTheory } from "@/lib/boundary/types";
import { formatEngineProse, formatMassSquared, worldvolumeKey, type ListedWorldvolume } from "@/lib/spectrum";
import { Badge } from "@/components/ui/badge";

export interface WorldvolumeTableProps {
  /** In full, or with their lists cut for the page (`listWorldvolume`), which the table then says. */
  worldvolumes: Array<WorldvolumeTheory | ListedWorldvolume>;
}

/**
 * The theory on each worldvolume, in full: its own massless content, the light states of strings
 * from stacks that fill it (with the role of their group), flavour groups, defects and the
 * supersymmetry in that dimension (alpha' = 1).
 */
export function WorldvolumeTable({ worldvolumes }: WorldvolumeTableProps) {
  if (worldvolumes.length === 0) {
    return <p className="text-sm text-muted-foreground">No worldvolume theories recorded for this result.</p>;
  }
  return (
    <div className="overflow-x-auto rounded-md border border-border bg-surface">
      <table className="w-full border-collapse text-sm" aria-label="Worldvolume theories" data-testid="worldvolume-table">
        <thead className="bg-surface-muted/70 text-xs text-muted-foreground">
          <tr>
            <th scope="col" className="px-3 py-1.5 text-left font-semibold">Stacks</th>
            <th scope="col" className="px-3 py-1.5 text-left font-semibold">Worldvolume</th>
            <th scope="col" className="px-3 py-1.5 text-left font-semibold">Gauge group and own strings</th>
            <th scope="col" className="px-3 py-1.5 text-left font-semibold">Strings from other stacks</th>
            <th scope="col" className="px-3 py-1.5 text-left font-semibold">Supersymmetry</th>
          </tr>
        </thead>
        <tbody>
          {worldvolumes.map((worldvolume) => (
            <tr key={worldvolumeKey(worldvolume)} className="border-t border-border align-top">
              <td className="px-3 py-1.5 font-mono whitespace-nowrap">{worldvolume.stacks.join(", ")}</td>
              <td className="px-3 py-1.5 whitespace-nowrap">
                {worldvolume.dimension}d
                <span className="block text-xs text-muted-foreground">
                  {worldvolume.worldvolume.length === 0 ? "time only" : `x0 and x${worldvolume.worldvolume.join(", x")}`}
                </span>
              </td>
              <td className="px-3 py-1.5">
                <span className="font-mono">{worldvolume.gaugeGroup}</span>
                <span className="block text-xs text-muted-foreground">{formatEngineProse(worldvolume.content)}</span>
              </td>
              <td className="px-3 py-1.5 text-xs">
                {worldvolume.matter.length === 0 && worldvolume.flavour.length === 0 && worldvolume.defects.length === 0 ? (
                  <span className="text-muted-foreground">none</span>
                ) : (
                  <ul className="grid gap-0.5">
                    {worldvolume.matter.map((matter) => (
                      <li key={`m-${matter.stacks.join("|")}`}>
                        {formatEngineProse(matter.description)}{" "}
                        <span className="text-muted-foreground">
                          ({matter.role === "flavour" ? "flavour" : "gauge"} stacks {matter.stacks.join(", ")}, &nu; = {matter.nu}, lightest
                          &alpha;&prime;M&sup2; = <span className="font-mono">{formatMassSquared(matter.massSquared)}</span>)
                        </span>
                      </li>
                    ))}
                    {worldvolume.flavour.map((group) => (
                      <li key={`f-${group.stacks.join("|")}`}>
                        Flavour symmetry <span className="font-mono">{group.group}</span> of the {group.dimension}d stacks {group.stacks.join(", ")}
                      </li>
                    ))}
                    {worldvolume.defects.map((defect) => (
                      <li key={`d-${defect.stacks.join("|")}`} className="text-muted-foreground">
                        {defect.dimension}d defect where stacks {defect.stacks.join(", ")} meet it: those strings live there
                      </li>
                    ))}
                    <OmittedEntries worldvolume={worldvolume} />
                  </ul>
                )}
              </td>
              <td className="px-3 py-1.5">
                <Badge variant={worldvolume.supercharges ? "success" : "outline"}>{worldvolume.supersymmetry}</Badge>
                {worldvolume.supercharges !== null ? (
                  <span className="block text-xs text-muted-foreground">
                    {worldvolume.supercharges} real supercharges
                    {worldvolume.chirality ? `; worldvolume chirality +${worldvolume.chirality.positive} / \u2212${worldvolume.chirality.negative}` : ""}
                  </span>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** "and 56 more ..." under a worldvolume whose lists were cut for the page. */
function OmittedEntries({ worldvolume }: { worldvolume: WorldvolumeTheory | ListedWorldvolume }) {
  if (!("omitted" in worldvolume)) return null;
  const { matter, flavour, defects } = worldvolume.omitted;
  const parts = [
    matter > 0 ? `${matter} more ${matter === 1 ? "entry" : "entries"} of strings from other stacks` : null,
    flavour > 0 ? `${flavour} more flavour ${flavour === 1 ? "group" : "groups"}` : null,
    defects > 0 ? `${defects} more ${defects === 1 ? "defect" : "defects"}` : null,
  ].filter((part): part is string => part !== null);
  if (parts.length === 0) return null;
  return (
    <li className="text-muted-foreground" data-testid="worldvolume-omitted">
      And {parts.join(", ")}: every entry is in the sector list below and in the JSON export.
    </li>
  );
}
