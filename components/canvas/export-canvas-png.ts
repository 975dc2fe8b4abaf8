import type { PngLegend } from "@/lib/designer/png-legend";
import { lightCanvasPalette } from "./use-canvas-palette";

/**
 * Saves what the designer's stage shows as a PNG with a title above it and a legend and scale
 * bar below, on the light palette whatever the page's theme (the stage redraws in light colours
 * while exporting: see `lightPalette` of the stage). Konva draws each layer into its own
 * <canvas> inside the stage's container, so the layers are composited in order onto one canvas.
 * Browser only.
 */
export function exportCanvasPng(container: HTMLElement, fileName: string, legend: PngLegend): boolean {
  // The stage marks itself once it has drawn with the light palette.
  if (!container.querySelector('[data-palette="light"]')) return false;
  const layers = Array.from(container.querySelectorAll("canvas"));
  const first = layers[0];
  if (!first || first.width === 0 || first.height === 0 || first.clientWidth === 0) return false;
  const ratio = first.width / first.clientWidth;
  const stageWidth = first.clientWidth;
  const stageHeight = first.height / ratio;

  const measure = window.document.createElement("canvas").getContext("2d");
  if (!measure) return false;
  const layout = layoutLegend(measure, legend, stageWidth);
  const width = stageWidth + 2 * padding;
  const height = headerHeight + stageHeight + layout.height + 2 * padding;

  const output = window.document.createElement("canvas");
  output.width = Math.round(width * ratio);
  output.height = Math.round(height * ratio);
  const context = output.getContext("2d");
  if (!context) return false;
  context.scale(ratio, ratio);
  const palette = lightCanvasPalette;
  context.fillStyle = palette.surface;
  context.fillRect(0, 0, width, height);

  context.fillStyle = palette.foreground;
  context.font = `600 18px ${sansFont}`;
  context.textBaseline = "top";
  context.fillText(legend.title, padding, padding, stageWidth);
  context.fillStyle = palette.muted;
  context.font = `12px ${sansFont}`;
  context.fillText(legend.subtitle, padding, padding + 26, stageWidth);

  const top = padding + headerHeight;
  context.fillStyle = palette.background;
  context.fillRect(padding, top, stageWidth, stageHeight);
  for (const layer of layers) context.drawImage(layer, padding, top, stageWidth, stageHeight);
  context.strokeStyle = palette.gridStrong;
  context.lineWidth = 1;
  context.strokeRect(padding + 0.5, top + 0.5, stageWidth - 1, stageHeight - 1);

  context.font = `12px ${sansFont}`;
  context.textBaseline = "middle";
  const legendTop = top + stageHeight + legendGap;
  for (const item of layout.items) drawEntry(context, item.entry, padding + item.x, legendTop + item.y);
  if (legend.scaleBar) {
    const y = legendTop + layout.entriesHeight + rowHeight / 2;
    context.strokeStyle = palette.foreground;
    context.lineWidth = 2;
    context.beginPath();
    context.moveTo(padding, y - 4);
    context.lineTo(padding, y + 4);
    context.moveTo(padding, y);
    context.lineTo(padding + legend.scaleBar.lengthPx, y);
    context.moveTo(padding + legend.scaleBar.lengthPx, y - 4);
    context.lineTo(padding + legend.scaleBar.lengthPx, y + 4);
    context.stroke();
    context.fillStyle = palette.foreground;
    context.fillText(legend.scaleBar.text, padding + legend.scaleBar.lengthPx + 8, y);
  }

  const link = window.document.createElement("a");
  link.href = output.toDataURL("image/png");
  link.download = fileName;
  link.click();
  return true;
}

/**
 * Exports once the canvas has been drawn in the light palette: the canvas library loads after
 * the page, and the stage redraws after the export asks for light colours, so a click waits for
 * both (checking every 100 ms) instead of doing nothing. Resolves to false when there is still no
 * drawn canvas after `timeoutMs`.
 */
export async function exportCanvasPngWhenReady(
  findContainer: () => HTMLElement | null,
  fileName: string,
  legend: PngLegend,
  timeoutMs = 10_000,
): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const container = findContainer();
    if (container?.querySelector('[data-palette="light"]')) {
      // Konva paints the light colours on the next animation frame after the stage re-renders.
      await nextFrame();
      await nextFrame();
      if (exportCanvasPng(container, fileName, legend)) return true;
    }
    if (Date.now() >= deadline) return false;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** A file name from a configuration title: lower case, dashes, no punctuation. */
export function pngFileName(title: string): string {
  const slug = title
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "");
  return `${slug || "configuration"}-canvas.png`;
}

function nextFrame(): Promise<void> {
  return new Promise((resolve) => window.requestAnimationFrame(() => resolve()));
}

const padding = 16;
const headerHeight = 48;
const legendGap = 12;
const rowHeight = 20;
const swatchWidth = 22;
const sansFont = "'IBM Plex Sans', sans-serif";

interface PlacedEntry {
  entry: PngLegend["entries"][number];
  x: number;
  y: number;
}

/** Places the legend entries in rows across the stage's width, then leaves a row for the scale bar. */
function layoutLegend(context: CanvasRenderingContext2D, legend: PngLegend, width: number) {
  context.font = `12px ${sansFont}`;
  const items: PlacedEntry[] = [];
  let x = 0;
  let y = rowHeight / 2;
  for (const entry of legend.entries) {
    const entryWidth = swatchWidth + 6 + context.measureText(entry.text).width + 18;
    if (x > 0 && x + entryWidth > width) {
      x = 0;
      y += rowHeight;
    }
    items.push({ entry, x, y });
    x += entryWidth;
  }
  const entriesHeight = legend.entries.length > 0 ? y + rowHeight / 2 : 0;
  return { items, entriesHeight, height: legendGap + entriesHeight + (legend.scaleBar ? rowHeight : 0) };
}

function drawEntry(context: CanvasRenderingContext2D, entry: PngLegend["entries"][number], x: number, y: number) {
  const palette = lightCanvasPalette;
  context.lineWidth = 2;
  context.strokeStyle = entry.colour;
  context.fillStyle = entry.colour;
  context.setLineDash(entry.swatch === "tachyon" ? [4, 3] : []);
  if (entry.swatch === "stack" || entry.swatch === "antistack") {
    context.beginPath();
    context.arc(x + swatchWidth / 2, y, 5, 0, 2 * Math.PI);
    if (entry.swatch === "stack") context.fill();
    else {
      context.fillStyle = palette.surface;
      context.fill();
    }
    context.stroke();
  } else {
    context.beginPath();
    context.moveTo(x, y);
    context.lineTo(x + swatchWidth, y);
    context.stroke();
  }
  context.setLineDash([]);
  context.fillStyle = palette.foreground;
  context.fillText(entry.text, x + swatchWidth + 6, y);
}
