/**
 * World <-> screen transforms for the designer canvas.
 *
 * World coordinates are positions along the two display axes in units of sqrt(alpha')
 * (the string length). Screen coordinates are CSS pixels with y pointing down, so the
 * world y axis is flipped: larger positions are drawn higher up.
 */

/** A 2D point. */
export interface Point {
  x: number;
  y: number;
}

/** An axis-aligned rectangle. */
export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/**
 * How the world is shown: `scale` pixels per unit of sqrt(alpha'), and the screen position
 * of the world origin.
 */
export interface Viewport {
  scale: number;
  originX: number;
  originY: number;
}

/** Smallest and largest zoom scale, in pixels per sqrt(alpha'). */
export const minScale = 4;
export const maxScale = 400;

/** Scale at zoom 100 %, in pixels per sqrt(alpha'). */
export const baseScale = 40;

/** Builds a viewport that centres the world origin on a stage of the given size. */
export function createViewport(width: number, height: number, scale: number = baseScale): Viewport {
  return { scale: clampScale(scale), originX: width / 2, originY: height / 2 };
}

/** Maps a world point to screen pixels. */
export function toScreen(point: Point, viewport: Viewport): Point {
  return {
    x: viewport.originX + point.x * viewport.scale,
    y: viewport.originY - point.y * viewport.scale,
  };
}

/** Maps a screen point (pixels) back to world coordinates. */
export function toWorld(point: Point, viewport: Viewport): Point {
  return {
    x: (point.x - viewport.originX) / viewport.scale,
    y: (viewport.originY - point.y) / viewport.scale,
  };
}

/** Keeps a scale inside [minScale, maxScale]. */
export function clampScale(scale: number): number {
  if (!Number.isFinite(scale)) return baseScale;
  return Math.min(maxScale, Math.max(minScale, scale));
}

/**
 * Zooms by `factor` while keeping the world point under `anchor` (screen pixels) fixed,
 * as a wheel zoom towards the cursor should.
 */
export function zoomAt(viewport: Viewport, factor: number, anchor: Point): Viewport {
  const scale = clampScale(viewport.scale * factor);
  const world = toWorld(anchor, viewport);
  return {
    scale,
    originX: anchor.x - world.x * scale,
    originY: anchor.y + world.y * scale,
  };
}

/** Moves the view by a screen-space offset in pixels. */
export function panBy(viewport: Viewport, dx: number, dy: number): Viewport {
  return { ...viewport, originX: viewport.originX + dx, originY: viewport.originY + dy };
}

/** The world rectangle visible on a stage of the given pixel size (y of the lower edge). */
export function visibleWorldRect(viewport: Viewport, width: number, height: number): Rect {
  const topLeft = toWorld({ x: 0, y: 0 }, viewport);
  const bottomRight = toWorld({ x: width, y: height }, viewport);
  return {
    x: topLeft.x,
    y: bottomRight.y,
    width: bottomRight.x - topLeft.x,
    height: topLeft.y - bottomRight.y,
  };
}

/**
 * Chooses a viewport that shows every given world point with a margin, keeping the scale
 * inside its limits. With no points the origin is centred at the base scale.
 */
export function fitToPoints(points: Point[], width: number, height: number, margin = 48): Viewport {
  if (points.length === 0) return createViewport(width, height);
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const spanX = Math.max(maxX - minX, 1);
  const spanY = Math.max(maxY - minY, 1);
  const usableW = Math.max(width - 2 * margin, 1);
  const usableH = Math.max(height - 2 * margin, 1);
  const scale = clampScale(Math.min(usableW / spanX, usableH / spanY, baseScale * 2));
  const centreX = (minX + maxX) / 2;
  const centreY = (minY + maxY) / 2;
  return { scale, originX: width / 2 - centreX * scale, originY: height / 2 + centreY * scale };
}
