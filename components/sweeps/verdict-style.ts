import type { PointVerdict } from "@/lib/sweeps";

/** How each verdict reads. */
export const verdictLabels: Record<PointVerdict, string> = {
  supersymmetric: "supersymmetric",
  tachyonic: "tachyonic",
  neither: "neither",
  invalid: "not allowed",
};

/** Text colour of each verdict in tables. */
export const verdictTextClass: Record<PointVerdict, string> = {
  supersymmetric: "font-medium text-success-soft-foreground",
  tachyonic: "font-medium text-danger-soft-foreground",
  neither: "text-foreground",
  invalid: "text-muted-foreground italic",
};

/** Fill of each verdict on the map and the plot (with a pattern-free second cue: the legend's labels). */
export const verdictFill: Record<PointVerdict, string> = {
  supersymmetric: "#3f8f5a",
  tachyonic: "#b5542c",
  neither: "#7a8494",
  invalid: "#d5d9df",
};
