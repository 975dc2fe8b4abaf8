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

const fallback: CanvasPalette = {
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
    background: read("--background", fallback.background),
    foreground: read("--foreground", fallback.foreground),
    muted: read("--muted-foreground", fallback.muted),
    grid: read("--border", fallback.grid),
    gridStrong: read("--border-strong", fallback.gridStrong),
    accent: read("--accent", fallback.accent),
    danger: read("--danger", fallback.danger),
    surface: read("--surface", fallback.surface),
  };
}

/** The canvas palette, refreshed when the light/dark class on <html> changes. */
export function useCanvasPalette(): CanvasPalette {
  const [palette, setPalette] = useState<CanvasPalette>(fallback);
  useEffect(() => {
    setPalette(readPalette());
    const observer = new MutationObserver(() => setPalette(readPalette()));
    observer.observe(document.documentElement, { attributes: true, attributeFilter: ["class"] });
    return () => observer.disconnect();
  }, []);
  return palette;
}
