"use client";

import { useEffect, useState } from "react";

/** Colours the canvas draws with, read from the theme's CSS variables. */
export interface CanvasPalette {
  background: string;
  foreground: string;
  muted: string;
  grid: string;
  gridStrong: string;
  accent: string;
  danger: string;
  surface: string;
}

/** The light theme's colours: the canvas before the theme is read, and every PNG export. */
export const lightCanvasPalette: CanvasPalette = {
  background: "#fafbfc",
  foreground: "#1f2633",
  muted: "#6b7385",
  grid: "#e6e9ef",
  gridStrong: "#c9ced8",
  accent: "#2a7f8f",
  danger: "#c0392b",
  surface: "#ffffff",
};

function readPalette(): CanvasPalette {
  const style = getComputedStyle(document.documentElement);
  const read = (name: string, fallbackValue: string) => style.getPropertyValue(name).trim() || fallbackValue;
  return {
    background: read("--background", lightCanvasPalette.background),
    foreground: read("--foreground", lightCanvasPalette.foreground),
    muted: read("--muted-foreground", lightCanvasPalette.muted),
    grid: read("--border", lightCanvasPalette.grid),
    gridStrong: read("--border-strong", lightCanvasPalette.gridStrong),
    accent: read("--accent", lightCanvasPalette.accent),
    danger: read("--danger", lightCanvasPalette.danger),
    surface: read("--surface", lightCanvasPalette.surface),
  };
}

/**
 * The canvas palette, refreshed when the light/dark class on <html> changes.
 *
 * @param light - Draw with the light palette whatever the theme (while exporting a PNG).
 */
export function useCanvasPalette(light = false): CanvasPalette {
  const [palette, setPalette] = useState<CanvasPalette>(lightCanvasPalette);
  useEffect(() => {
    setPalette(readPalette());
    const observer = new MutationObserver(() => setPalette(readPalette()));
    observer.observe(document.documentElement, { attributes: true, attributeFilter: ["class"] });
    return () => observer.disconnect();
  }, []);
  return light ? lightCanvasPalette : palette;
}
