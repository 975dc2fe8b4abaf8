"use client";

import katex from "katex";
import "katex/dist/katex.min.css";
import { useMemo } from "react";
import { bosonExpansionLatex, fermionExpansionLatex, lightConeAxis } from "@/lib/boundary/expansion";
import type { AxisExpansion } from "@/lib/boundary/types";
import { simplifyExpansionLatex } from "@/lib/spectrum";
import { Badge } from "@/components/ui/badge";

export interface ModeExpansionsProps {
  axes: AxisExpansion[];
}

/**
 * The mode expansion X(tau, sigma) of each axis of a sector and, in type II, the worldsheet
 * fermions psi and psi~ per sector, typeset with KaTeX; the axis paired with time in the
 * light-cone gauge is marked.
 */
export function ModeExpansions({ axes }: ModeExpansionsProps) {
  const rendered = useMemo(
    () =>
      axes.map((axis) => {
        // Type II axes carry fermion modings; the expansions follow from the axis type alone.
        const latex = axis.fermionModing ? fermionExpansionLatex(axis) : null;
        const source = bosonExpansionLatex(axis);
        return { axis, source, latex, boson: typeset(simplifyExpansionLatex(source)), fermions: latex ? { NS: typeset(latex.NS), R: typeset(latex.R) } : null };
      }),
    [axes],
  );
  const fermions = rendered.some((entry) => entry.fermions !== null);
  const partner = lightConeAxis({ axes });
  const lightCone = partner !== null;
  if (axes.length === 0) return <p className="text-xs text-muted-foreground">No mode expansions in this result.</p>;
  return (
    <div className="grid gap-1">
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
          {rendered.map(({ axis, source, latex, boson, fermions: psi }) => (
            <tr key={axis.axis} className="border-t border-border align-middle">
              <td className="px-2 py-1 font-mono whitespace-nowrap">
                x{axis.axis}
                {axis.axis === partner ? (
                  <Badge variant="accent" className="ml-1" title={"Paired with time in the light-cone gauge, x\u00b1 = x0 \u00b1 this axis"}>
                    light-cone
                  </Badge>
                ) : null}
              </td>
              <td className="px-2 py-1 font-mono">{axis.type}</td>
              <td className="px-2 py-1 whitespace-nowrap">
                {axis.bosonModing}
                {axis.fermionModing ? `; ${axis.fermionModing.NS} / ${axis.fermionModing.R}` : ""}
              </td>
              <td className="overflow-x-auto px-2 py-1 text-sm">
                <div title={source} dangerouslySetInnerHTML={{ __html: boson }} />
                {psi ? (
                  <div className="mt-0.5 grid gap-0.5 text-xs">
                    <div title={latex?.NS}>
                      <span className="mr-1 font-sans text-muted-foreground">NS:</span>
                      <span dangerouslySetInnerHTML={{ __html: psi.NS }} />
                    </div>
                    <div title={latex?.R}>
                      <span className="mr-1 font-sans text-muted-foreground">R:</span>
                      <span dangerouslySetInnerHTML={{ __html: psi.R }} />
                    </div>
                  </div>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-[11px] text-muted-foreground">
        {lightCone ? (
          <>
            The light-cone axis is paired with time, x<sup>&plusmn;</sup> = x<sup>0</sup> &plusmn; x<sup>k</sup>; the counts use the
            other axes.
          </>
        ) : (
          "No axis is left for the light-cone gauge: this sector is counted covariantly."
        )}
        {fermions
          ? " Fermion boundary signs: \u03c8 = +\u03c8\u0303 at a Neumann end and \u2212\u03c8\u0303 at a Dirichlet end of \u03c3 = 0; the same times +1 (R) or \u22121 (NS) at \u03c3 = \u03c0. Normalisations are left out."
          : ""}
      </p>
    </div>
  );
}

function typeset(latex: string): string {
  return katex.renderToString(latex, { throwOnError: false, displayMode: false, output: "html" });
}
