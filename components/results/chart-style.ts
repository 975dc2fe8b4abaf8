/** Styling shared by the results plots, so both read as one family in light and dark themes. */

/** Stroke and tick size of every axis. */
export const axisStyle = { stroke: "var(--muted-foreground)", fontSize: 11 } as const;

/** The label of the horizontal axis. */
export function horizontalAxisLabel(value: string) {
  return { value, position: "insideBottom", offset: -16, fill: "var(--muted-foreground)", fontSize: 12 } as const;
}

/** The label of the vertical axis, turned to read upwards. */
export function verticalAxisLabel(value: string) {
  return { value, angle: -90, position: "insideLeft", fill: "var(--muted-foreground)", fontSize: 12 } as const;
}

/** The tooltip box. */
export const tooltipContentStyle = { background: "var(--surface-raised)", border: "1px solid var(--border)", fontSize: 12 } as const;
