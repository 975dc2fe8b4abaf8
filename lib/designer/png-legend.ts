/**
 * What a PNG of the canvas carries besides the drawing, so the picture stands on its own in a
 * talk or a paper: a title, a legend of the stacks and strings, and a scale bar in units of
 * sqrt(alpha'). Pure; the browser code in components/canvas draws it.
 *
 * Invalid-input policy: pure and total; a non-positive or non-finite scale gives no scale bar.
 */
import type { Configuration } from "@/lib/boundary/types";
import type { DisplayAxes } from "@/lib/canvas/projection";
import { formatNumber, sectorNames } from "@/lib/spectrum";
import { defaultStackColour } from "./scene";
import { stackKind } from "./stack-kind";

/** One entry of the legend. */
export interface PngLegendEntry {
  /** CSS colour of the swatch. */
  colour: string;
  /** "solid" for a stack (hollow when an antibrane), "string" or "tachyon" for the curves. */
  swatch: "stack" | "antistack" | "string" | "tachyon";
  text: string;
}

/** The text and legend around the canvas in its PNG. */
export interface PngLegend {
  title: string;
  /** Theory, display axes and conventions on one line. */
  subtitle: string;
  entries: PngLegendEntry[];
  /** A scale bar: its length in CSS pixels and its label, or null without a usable scale. */
  scaleBar: { lengthPx: number; text: string } | null;
}

/** Scale bar lengths tried, in sqrt(alpha'): the largest that fits in `maxBarPx` is used. */
const barLengths = [100, 50, 20, 10, 5, 2, 1, 0.5, 0.2, 0.1, 0.05, 0.02, 0.01];
const maxBarPx = 160;

/**
 * The title, legend and scale bar of a canvas PNG.
 *
 * @param document - The configuration drawn (title, theory, stacks).
 * @param axes - The display axes.
 * @param scale - The canvas scale in CSS pixels per sqrt(alpha').
 * @returns Title, subtitle, one legend entry per stack plus the string kinds, and a scale bar.
 * @example
 * pngLegend(document, { horizontal: 4, vertical: 5 }, 40).scaleBar // => { lengthPx: 80, text: "2 √α′" }
 */
export function pngLegend(document: Pick<Configuration, "title" | "theory" | "stacks">, axes: DisplayAxes, scale: number): PngLegend {
  const names = sectorNames(document.stacks);
  const entries: PngLegendEntry[] = document.stacks.map((stack) => ({
    colour: stack.colour ?? defaultStackColour,
    swatch: stack.anti && document.theory !== "bosonic" ? "antistack" : "stack",
    text: `${names.stack(stack.id)}: ${stackKind(stack, document.theory)}, N = ${stack.count}`,
  }));
  if (document.stacks.length > 1) {
    entries.push({ colour: "#6b7385", swatch: "string", text: "string, labelled with its lightest \u03b1\u2032M\u00b2" });
    entries.push({ colour: "#c0392b", swatch: "tachyon", text: "tachyonic string" });
  }
  const length = Number.isFinite(scale) && scale > 0 ? barLengths.find((units) => units * scale <= maxBarPx) : undefined;
  return {
    title: document.title,
    subtitle: `${document.theory}; horizontal x${axes.horizontal}, vertical x${axes.vertical}; lengths in \u221a\u03b1\u2032 (\u03b1\u2032 = 1)`,
    entries,
    scaleBar: length === undefined ? null : { lengthPx: length * scale, text: `${formatNumber(length)} \u221a\u03b1\u2032` },
  };
}
