import { formatMassSquared, formatNumber, isTachyonicState } from "@/lib/spectrum";

/** alpha' M^2 as every table and summary shows it: exact where exact, in the danger colour when negative. */
export function MassSquaredText({ value }: { value: string }) {
  return isTachyonicState({ massSquared: value }) ? (
    <span className="text-danger-soft-foreground">{formatMassSquared(value)}</span>
  ) : (
    <>{formatMassSquared(value)}</>
  );
}

/** M sqrt(alpha'), which has no real value for a tachyon: the word says so instead of a dash. */
export function MassText({ value }: { value: number | null }) {
  return value === null ? <span className="font-sans text-danger-soft-foreground">tachyon</span> : <>{formatNumber(value)}</>;
}
