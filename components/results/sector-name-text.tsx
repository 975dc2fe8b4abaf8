import type { SectorNames } from "@/lib/spectrum";

export interface SectorNameTextProps {
  names: SectorNames;
  pair: readonly [string, string];
  className?: string;
}

/** A sector named by its stacks' labels, with the stack ids on hover when they differ from the labels. */
export function SectorNameText({ names, pair, className }: SectorNameTextProps) {
  const name = names.sector(pair);
  return (
    <span className={className} title={name.ids === name.text ? undefined : `Stacks ${name.ids}`}>
      {name.text}
    </span>
  );
}
