import { Badge } from "@/components/ui/badge";

/** Supersymmetry of a summary row: supercharges for type II, "n/a" for bosonic (null). */
export function SupersymmetryBadge({ supercharges }: { supercharges: number | null }) {
  if (supercharges === null) return <span className="text-muted-foreground">n/a</span>;
  return supercharges > 0 ? <Badge variant="success">{supercharges} supercharges</Badge> : <Badge variant="neutral">none</Badge>;
}

/** Tachyon status of a summary row; the dashed danger border matches the tachyonic sectors on the results page. */
export function TachyonBadge({ tachyonic }: { tachyonic: boolean }) {
  return tachyonic ? (
    <Badge variant="danger" className="border-dashed border-danger">
      tachyon
    </Badge>
  ) : (
    <Badge variant="outline">stable</Badge>
  );
}
