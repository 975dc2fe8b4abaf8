/**
 * Reading the tower of momentum and winding states of a result on compact axes (engine 1.2.0
 * on): its quantum numbers as text, the axes a sector's tower can be plotted against, and the
 * points of that plot. Pure and total: a result without towers reads as having none.
 */
import type { Sector, SpectrumResult, TowerState } from "@/lib/boundary/types";
import { parseResultNumber } from "./result-number";

/** One quantum number of a tower state: momentum n on an NN axis or winding w on a DD axis. */
export interface QuantumNumber {
  axis: number;
  kind: "n" | "w";
  value: number;
}

/**
 * The momentum and winding numbers of a tower state, in axis order.
 *
 * @example
 * quantumNumbers({ momentum: { "9": 1 }, winding: { "8": -2 } }) // => [{ axis: 8, kind: "w", value: -2 }, { axis: 9, kind: "n", value: 1 }]
 */
export function quantumNumbers(state: Pick<TowerState, "momentum" | "winding">): QuantumNumber[] {
  const entries: QuantumNumber[] = [
    ...Object.entries(state.momentum).map(([axis, value]) => ({ axis: Number(axis), kind: "n" as const, value })),
    ...Object.entries(state.winding).map(([axis, value]) => ({ axis: Number(axis), kind: "w" as const, value })),
  ];
  return entries.sort((x, y) => x.axis - y.axis);
}

/**
 * The quantum numbers as compact text, "n9 = 1, w8 = -2" in axis order ("none" without compact axes).
 *
 * @example
 * quantumNumberText({ momentum: { "9": 1 }, winding: {} }) // => "n9 = 1"
 */
export function quantumNumberText(state: Pick<TowerState, "momentum" | "winding">, separator = ", "): string {
  const entries = quantumNumbers(state);
  if (entries.length === 0) return "none";
  return entries.map((entry) => `${entry.kind}${entry.axis} = ${entry.value}`).join(separator);
}

/**
 * Whether any sector of a result carries a tower (the configuration has compact axes).
 *
 * @example
 * resultHasTower(flatResult) // => false
 */
export function resultHasTower(result: Pick<SpectrumResult, "sectors">): boolean {
  return result.sectors.some((sector) => sector.tower !== undefined);
}

/** A point of the tower plot: alpha' M^2 against the momentum or winding number on one axis. */
export interface TowerPoint {
  /** n or w on the plotted axis. */
  number: number;
  massSquared: number;
  sector: TowerState["sector"];
  level: string;
  /** Every quantum number of the state, for the tooltip. */
  label: string;
}

/**
 * The points of a sector's tower plotted against one compact axis, with the other numbers of
 * each state left to the tooltip.
 *
 * @param sector - A sector with its detail (only `tower` is read).
 * @param axis - The compact axis to plot against.
 * @returns One point per tower state, in tower order (lightest first); rows whose alpha' M^2
 *   cannot be read are left out.
 * @example
 * towerPoints(sector, 9)[0] // => { number: 0, massSquared: -0.5, sector: "NS", level: "0", label: "n9 = 0" }
 */
export function towerPoints(sector: Pick<Sector, "tower">, axis: number): TowerPoint[] {
  const key = String(axis);
  const points: TowerPoint[] = [];
  for (const state of sector.tower ?? []) {
    const number = state.momentum[key] ?? state.winding[key];
    const massSquared = parseResultNumber(state.massSquared);
    if (number === undefined || Number.isNaN(massSquared)) continue;
    points.push({ number, massSquared, sector: state.sector, level: state.level, label: quantumNumberText(state) });
  }
  return points;
}
