"use client";

import type Konva from "konva";
// Konva's core and only the shapes drawn here, not the whole library (Konva's minimal-bundle
// imports): the designer's first load stays light.
import "konva/lib/shapes/Circle";
import "konva/lib/shapes/Line";
import "konva/lib/shapes/Rect";
import "konva/lib/shapes/Text";
import { useMemo, useState } from "react";
import { Circle, Group, Layer, Line, Rect, Stage, Text } from "react-konva/lib/ReactKonvaCore";
import type { Configuration, SpectrumResult } from "@/lib/boundary/types";
import { hitTest, rectFromCorners, stacksInRect } from "@/lib/canvas/hit-test";
import { draggableAxes, type DisplayAxes } from "@/lib/canvas/projection";
import { panBy, toWorld, zoomAt, type Point, type Viewport } from "@/lib/canvas/viewport";
import { buildCompactScene, type CompactStrip } from "@/lib/designer/compact-scene";
import { buildScene, curveLabelWidth, sceneFontSize, type SceneCurve, type ScenePlane, type SceneStack } from "@/lib/designer/scene";
import type { SelectionMode } from "@/lib/client/designer-store";
import { useCanvasPalette, type CanvasPalette } from "./use-canvas-palette";

export interface ConfigurationStageProps {
  document: Configuration;
  result: SpectrumResult | null;
  /** Stage size in CSS pixels (the parent measures its box). */
  width: number;
  height: number;
  displayAxes: DisplayAxes;
  selection: readonly string[];
  viewport: Viewport;
  gridStep: number;
  snapping: boolean;
  tool: "select" | "pan";
  readOnly?: boolean;
  /** Draw with the light palette whatever the theme (while a PNG is exported). */
  lightPalette?: boolean;
  onViewportChange: (viewport: Viewport) => void;
  onSelect?: (ids: string[], mode: SelectionMode) => void;
  /** Moves the given stacks by a world offset on the display axes (axis number -> offset), as one gesture. */
  onMove?: (ids: string[], delta: Record<string, number>, gesture: string) => void;
  onGestureEnd?: () => void;
}

type Drag =
  | { kind: "move"; ids: string[]; from: Point; gesture: string; axes: { x: boolean; y: boolean } }
  | { kind: "pan"; last: Point }
  | { kind: "marquee"; from: Point; to: Point; additive: boolean };

/** Pixels within which a click picks a stack. */
const hitTolerancePx = 9;

let gestureCounter = 0;

/**
 * The react-konva stage of the designer: grid, stacks projected onto the display axes,
 * strings between stacks labelled with their lightest mass, and pointer interaction
 * (select, shift-select, marquee, drag, wheel zoom, pan). Browser only.
 */
export function ConfigurationStage(props: ConfigurationStageProps) {
  const { document, result, displayAxes, selection, viewport, gridStep, snapping, tool, readOnly = false, lightPalette = false } = props;
  const size = useMemo(() => ({ width: props.width, height: props.height }), [props.width, props.height]);
  const [drag, setDrag] = useState<Drag | null>(null);
  const palette = useCanvasPalette(lightPalette);

  const { onViewportChange } = props;
  const scene = useMemo(
    () =>
      size.width > 0
        ? buildScene({ document, result, axes: displayAxes, viewport, width: size.width, height: size.height, selection, gridStep })
        : null,
    [document, result, displayAxes, viewport, size, selection, gridStep],
  );
  const compactScene = useMemo(
    () =>
      scene ? buildCompactScene({ document, axes: displayAxes, viewport, width: size.width, height: size.height, stacks: scene.stacks }) : null,
    [scene, document, displayAxes, viewport, size],
  );

  function pointer(event: Konva.KonvaEventObject<MouseEvent | WheelEvent>): Point {
    const stage = event.target.getStage();
    return stage?.getPointerPosition() ?? { x: 0, y: 0 };
  }

  function onMouseDown(event: Konva.KonvaEventObject<MouseEvent>) {
    if (!scene) return;
    const at = pointer(event);
    const panning = tool === "pan" || event.evt.button === 1 || event.evt.altKey;
    if (panning || readOnly) {
      setDrag({ kind: "pan", last: at });
      return;
    }
    const world = toWorld(at, viewport);
    const id = hitTest(scene.hitEntries, world, hitTolerancePx / viewport.scale);
    const additive = event.evt.shiftKey || event.evt.metaKey || event.evt.ctrlKey;
    if (id === null) {
      if (!additive) props.onSelect?.([], "replace");
      setDrag({ kind: "marquee", from: at, to: at, additive });
      return;
    }
    if (additive) {
      props.onSelect?.([id], "toggle");
      return;
    }
    const ids = selection.includes(id) ? [...selection] : [id];
    if (!selection.includes(id)) props.onSelect?.([id], "replace");
    const entry = scene.hitEntries.find((e) => e.id === id);
    const axes = entry ? draggableAxes(entry.shape) : { x: false, y: false };
    gestureCounter += 1;
    setDrag({ kind: "move", ids, from: world, gesture: `drag-${gestureCounter}`, axes });
  }

  function onMouseMove(event: Konva.KonvaEventObject<MouseEvent>) {
    if (!drag) return;
    const at = pointer(event);
    if (drag.kind === "pan") {
      onViewportChange(panBy(viewport, at.x - drag.last.x, at.y - drag.last.y));
      setDrag({ kind: "pan", last: at });
    } else if (drag.kind === "marquee") {
      setDrag({ ...drag, to: at });
    } else {
      const world = toWorld(at, viewport);
      const delta: Record<string, number> = {};
      if (drag.axes.x) delta[String(displayAxes.horizontal)] = world.x - drag.from.x;
      if (drag.axes.y) delta[String(displayAxes.vertical)] = world.y - drag.from.y;
      if (Object.keys(delta).length > 0) props.onMove?.(drag.ids, delta, drag.gesture);
    }
  }

  function onMouseUp() {
    if (drag?.kind === "marquee" && scene) {
      const a = toWorld(drag.from, viewport);
      const b = toWorld(drag.to, viewport);
      if (Math.hypot(drag.to.x - drag.from.x, drag.to.y - drag.from.y) > 4) {
        props.onSelect?.(stacksInRect(scene.hitEntries, rectFromCorners(a, b)), drag.additive ? "add" : "replace");
      }
    }
    if (drag?.kind === "move") props.onGestureEnd?.();
    setDrag(null);
  }

  function onWheel(event: Konva.KonvaEventObject<WheelEvent>) {
    event.evt.preventDefault();
    const factor = Math.exp(-event.evt.deltaY * 0.0015);
    onViewportChange(zoomAt(viewport, factor, pointer(event)));
  }

  const cursor = tool === "pan" || readOnly ? (drag?.kind === "pan" ? "grabbing" : "grab") : drag?.kind === "move" ? "move" : "default";

  return (
    <div className="absolute inset-0" style={{ cursor }} data-snapping={snapping ? "on" : "off"} data-palette={lightPalette ? "light" : "theme"}>
      {scene && size.width > 0 ? (
        <Stage
          width={size.width}
          height={size.height}
          onMouseDown={onMouseDown}
          onMouseMove={onMouseMove}
          onMouseUp={onMouseUp}
          onMouseLeave={onMouseUp}
          onWheel={onWheel}
        >
          <Layer listening={false}>
            {scene.verticalLines.map((line) => (
              <Line
                key={`v${line.x}`}
                points={[line.x, 0, line.x, size.height]}
                stroke={line.origin ? palette.gridStrong : palette.grid}
                strokeWidth={line.origin ? 1.25 : 0.75}
              />
            ))}
            {scene.horizontalLines.map((line) => (
              <Line
                key={`h${line.y}`}
                points={[0, line.y, size.width, line.y]}
                stroke={line.origin ? palette.gridStrong : palette.grid}
                strokeWidth={line.origin ? 1.25 : 0.75}
              />
            ))}
            {compactScene?.strips.map((strip) => (
              <CompactStripShape key={`strip-${strip.direction}`} strip={strip} width={size.width} height={size.height} palette={palette} />
            ))}
            <Text
              x={size.width - 64}
              y={size.height - 22}
              text={`x${displayAxes.horizontal} \u2192`}
              fontSize={sceneFontSize}
              fontFamily="IBM Plex Mono, monospace"
              fill={palette.muted}
            />
            <Text x={10} y={size.height - 22} text={`x${displayAxes.vertical} \u2191`} fontSize={sceneFontSize} fontFamily="IBM Plex Mono, monospace" fill={palette.muted} />
          </Layer>
          <Layer listening={false}>
            {compactScene?.images.map((image) => (
              <Group key={image.id} opacity={0.28}>
                <StackShape stack={image} width={size.width} height={size.height} palette={palette} />
              </Group>
            ))}
            {scene.planes.map((plane) => (
              <PlaneShape key={plane.id} plane={plane} width={size.width} height={size.height} palette={palette} />
            ))}
            {scene.images.map((image) => (
              <Group key={image.id} opacity={0.32}>
                <StackShape stack={image} width={size.width} height={size.height} palette={palette} />
                <Text x={image.labelAt.x} y={image.labelAt.y} text={image.label} fontSize={sceneFontSize - 1} fontFamily="IBM Plex Sans, sans-serif" fill={palette.foreground} />
              </Group>
            ))}
            {scene.stacks
              .filter((s) => s.shape.kind === "fill")
              .map((stack) => (
                <StackShape key={stack.id} stack={stack} width={size.width} height={size.height} palette={palette} />
              ))}
            {scene.curves.map((curve) => (
              <CurveShape key={curve.key} curve={curve} palette={palette} />
            ))}
            {scene.stacks
              .filter((s) => s.shape.kind !== "fill")
              .map((stack) => (
                <StackShape key={stack.id} stack={stack} width={size.width} height={size.height} palette={palette} />
              ))}
            {scene.stacks.map((stack) => (
              <Text
                key={`label-${stack.id}`}
                x={stack.labelAt.x}
                y={stack.labelAt.y}
                text={stack.label}
                fontSize={sceneFontSize}
                fontFamily="IBM Plex Sans, sans-serif"
                fontStyle={stack.selected ? "bold" : "normal"}
                fill={palette.foreground}
              />
            ))}
            {drag?.kind === "marquee" ? (
              <Rect
                {...rectFromCorners(drag.from, drag.to)}
                stroke={palette.accent}
                strokeWidth={1}
                fill={palette.accent}
                opacity={0.15}
              />
            ) : null}
          </Layer>
        </Stage>
      ) : null}
    </div>
  );
}

interface PlaneShapeProps {
  plane: ScenePlane;
  width: number;
  height: number;
  palette: CanvasPalette;
}

/**
 * Visual language of an orientifold plane, unlike any stack: a dashed "mirror" with short hatches
 * on one side (a line), a hollow diamond (a point) or a dashed frame (the whole view); O+ hatches
 * point the other way. The label names the plane and O-p with its sign.
 */
function PlaneShape({ plane, width, height, palette }: PlaneShapeProps) {
  const { shape, screen } = plane;
  const colour = palette.muted;
  const tick = plane.type === "O-" ? 6 : -6;
  const labelText = <Text x={screen.x + 8} y={screen.y + 6} text={plane.label} fontSize={sceneFontSize - 1} fontFamily="IBM Plex Mono, monospace" fill={colour} />;
  if (shape.kind === "point") {
    const r = 9;
    return (
      <Group>
        <Line points={[screen.x, screen.y - r, screen.x + r, screen.y, screen.x, screen.y + r, screen.x - r, screen.y]} closed stroke={colour} strokeWidth={1.5} dash={[3, 2]} />
        {labelText}
      </Group>
    );
  }
  if (shape.kind === "horizontal-line" || shape.kind === "vertical-line") {
    const horizontal = shape.kind === "horizontal-line";
    const hatches: number[][] = [];
    for (let at = 0; at < (horizontal ? width : height); at += 14) {
      hatches.push(horizontal ? [at, screen.y, at + 5, screen.y + tick] : [screen.x, at, screen.x + tick, at + 5]);
    }
    return (
      <Group>
        <Line points={horizontal ? [0, screen.y, width, screen.y] : [screen.x, 0, screen.x, height]} stroke={colour} strokeWidth={1.5} dash={[8, 4]} />
        {hatches.map((points) => (
          <Line key={points.join(",")} points={points} stroke={colour} strokeWidth={1} />
        ))}
        <Text x={horizontal ? 12 : screen.x + 8} y={horizontal ? screen.y + 8 : 12} text={plane.label} fontSize={sceneFontSize - 1} fontFamily="IBM Plex Mono, monospace" fill={colour} />
      </Group>
    );
  }
  return (
    <Group>
      <Rect x={4} y={4} width={width - 8} height={height - 8} stroke={colour} strokeWidth={1} dash={[8, 4]} />
      <Text x={12} y={height - 40} text={plane.label} fontSize={sceneFontSize - 1} fontFamily="IBM Plex Mono, monospace" fill={colour} />
    </Group>
  );
}

interface StackShapeProps {
  stack: SceneStack;
  width: number;
  height: number;
  palette: CanvasPalette;
}

/**
 * Visual language: a brane is drawn solid (filled disc, thick bar, tinted plane); an
 * antibrane is drawn hollow (ring, twin rails, plane with a double border) so the difference
 * does not rest on colour. Selection adds an accent halo.
 */
function StackShape({ stack, width, height, palette }: StackShapeProps) {
  const halo = stack.selected ? { shadowColor: palette.accent, shadowBlur: 10, shadowOpacity: 0.9 } : {};
  const { shape, screen, colour, anti } = stack;
  if (shape.kind === "point") {
    const radius = 7 + Math.min(6, Math.log2(stack.count) * 1.5);
    return (
      <Group>
        {stack.selected ? <Circle x={screen.x} y={screen.y} radius={radius + 5} stroke={palette.accent} strokeWidth={2} /> : null}
        <Circle
          x={screen.x}
          y={screen.y}
          radius={radius}
          fill={anti ? palette.surface : colour}
          stroke={colour}
          strokeWidth={anti ? 3 : 1.5}
          {...halo}
        />
        {anti ? <Line points={[screen.x - radius * 0.6, screen.y, screen.x + radius * 0.6, screen.y]} stroke={colour} strokeWidth={2} /> : null}
      </Group>
    );
  }
  if (shape.kind === "horizontal-line" || shape.kind === "vertical-line") {
    const horizontal = shape.kind === "horizontal-line";
    const along = (offset: number) =>
      horizontal ? [0, screen.y + offset, width, screen.y + offset] : [screen.x + offset, 0, screen.x + offset, height];
    return (
      <Group>
        {stack.selected ? <Line points={along(0)} stroke={palette.accent} strokeWidth={12} opacity={0.25} /> : null}
        {anti ? (
          <>
            <Line points={along(-3)} stroke={colour} strokeWidth={1.75} {...halo} />
            <Line points={along(3)} stroke={colour} strokeWidth={1.75} />
          </>
        ) : (
          <Line points={along(0)} stroke={colour} strokeWidth={4} lineCap="round" {...halo} />
        )}
      </Group>
    );
  }
  return (
    <Group>
      <Rect x={0} y={0} width={width} height={height} fill={colour} opacity={stack.selected ? 0.14 : 0.07} />
      <Rect x={2} y={2} width={width - 4} height={height - 4} stroke={colour} strokeWidth={anti ? 1 : 3} opacity={0.6} />
      {anti ? <Rect x={7} y={7} width={width - 14} height={height - 14} stroke={colour} strokeWidth={1} opacity={0.6} /> : null}
    </Group>
  );
}

interface CompactStripShapeProps {
  strip: CompactStrip;
  width: number;
  height: number;
  palette: CanvasPalette;
}

/**
 * Visual language of a circle: the strip [0, 2 pi R) is lightly tinted, and each seam (where the
 * circle closes on itself) is a pair of dotted rails with small matching ticks, so that the two
 * edges read as one place; images of the stacks beyond the seams are drawn faintly.
 */
function CompactStripShape({ strip, width, height, palette }: CompactStripShapeProps) {
  const horizontal = strip.direction === "horizontal";
  const low = Math.min(strip.from, strip.to);
  const extent = Math.abs(strip.to - strip.from);
  const rail = (at: number, offset: number) => (horizontal ? [at + offset, 0, at + offset, height] : [0, at + offset, width, at + offset]);
  const ticks = (at: number) =>
    Array.from({ length: Math.ceil((horizontal ? height : width) / 48) }, (_, i) => {
      const along = 24 + i * 48;
      return horizontal ? [at - 5, along, at + 5, along - 6] : [along, at - 5, along + 6, at + 5];
    });
  return (
    <Group>
      <Rect
        x={horizontal ? low : 0}
        y={horizontal ? 0 : low}
        width={horizontal ? extent : width}
        height={horizontal ? height : extent}
        fill={palette.accent}
        opacity={0.05}
      />
      {strip.seams.map((at) => (
        <Group key={at}>
          <Line points={rail(at, -2)} stroke={palette.accent} strokeWidth={1} dash={[1, 4]} opacity={0.8} />
          <Line points={rail(at, 2)} stroke={palette.accent} strokeWidth={1} dash={[1, 4]} opacity={0.8} />
          {ticks(at).map((points) => (
            <Line key={points.join(",")} points={points} stroke={palette.accent} strokeWidth={1} opacity={0.6} />
          ))}
        </Group>
      ))}
      <Text
        x={horizontal ? low + 6 : 10}
        y={horizontal ? 8 : low - sceneFontSize - 6}
        text={strip.caption}
        fontSize={sceneFontSize - 1}
        fontFamily="IBM Plex Mono, monospace"
        fill={palette.accent}
      />
    </Group>
  );
}

interface CurveShapeProps {
  curve: SceneCurve;
  palette: CanvasPalette;
}

/** A string between two stacks; tachyonic sectors are dashed and say "tachyon" in the label. */
function CurveShape({ curve, palette }: CurveShapeProps) {
  const colour = curve.tachyonic ? palette.danger : palette.muted;
  return (
    <Group>
      <Line
        points={curve.points}
        bezier
        stroke={colour}
        strokeWidth={curve.tachyonic ? 2 : 1.25}
        dash={curve.tachyonic ? [7, 5] : undefined}
        lineCap="round"
      />
      {curve.label ? (
        <Group x={curve.labelAt.x} y={curve.labelAt.y}>
          <Rect
            width={curveLabelWidth(curve.label)}
            height={sceneFontSize + 6}
            fill={palette.surface}
            opacity={0.85}
            cornerRadius={3}
            stroke={curve.tachyonic ? palette.danger : undefined}
            strokeWidth={curve.tachyonic ? 1 : 0}
            dash={curve.tachyonic ? [3, 2] : undefined}
          />
          <Text x={4} y={3} text={curve.label} fontSize={sceneFontSize - 1} fontFamily="IBM Plex Mono, monospace" fill={curve.tachyonic ? palette.danger : palette.foreground} />
        </Group>
      ) : null}
    </Group>
  );
}
