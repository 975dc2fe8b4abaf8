"use client";

import katex from "katex";
import "katex/dist/katex.min.css";
import { useMemo } from "react";
import type { AxisExpansion } from "@/lib/boundary/types";

export interface ModeExpansionsProps {
  axes: AxisExpansion[];
}

/** The mode expansion X(tau, sigma) of each axis of a sector, typeset with KaTeX. */
export function ModeExpansions({ axes }: ModeExpansionsProps) {
  const rendered = useMemo(
    () =>
      axes.map((axis) => ({
        axis,
        html: katex.renderToString(axis.latex, { throwOnError: false, displayMode: false, output: "html" }),
      })),
    [axes],
  );
  return (
    <table className="w-full border-collapse text-xs">
      <caption className="sr-only">Mode expansions per axis</caption>
      <thead className="text-muted-foreground">
        <tr>
          <th scope="col" className="px-2 py-1 text-left font-semibold">Axis</th>
          <th scope="col" className="px-2 py-1 text-left font-semibold">Type</th>
          <th scope="col" className="px-2 py-1 text-left font-semibold">Moding (X; &psi; NS / R)</th>
          <th scope="col" className="px-2 py-1 text-left font-semibold">Expansion</th>
        </tr>
      </thead>
      <tbody>
        {rendered.map(({ axis, html }) => (
          <tr key={axis.axis} className="border-t border-border align-middle">
            <td className="px-2 py-1 font-mono">x{axis.axis}</td>
            <td className="px-2 py-1 font-mono">{axis.type}</td>
            <td className="px-2 py-1 whitespace-nowrap">
              {axis.bosonModing}
              {axis.fermionModing ? `; ${axis.fermionModing.NS} / ${axis.fermionModing.R}` : ""}
            </td>
            <td className="overflow-x-auto px-2 py-1 text-sm" title={axis.latex}>
              <span dangerouslySetInnerHTML={{ __html: html }} />
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
