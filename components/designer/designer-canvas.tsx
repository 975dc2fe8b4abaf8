"use client";

import dynamic from "next/dynamic";
import { useCallback, useEffect, useRef, useState } from "react";
import type { Configuration, SpectrumResult } from "@/lib/boundary/types";
import type { DisplayAxes } from "@/lib/canvas/projection";
import { baseScale, zoomAt } from "@/lib/canvas/viewport";
import { spatialAxes } from "@/lib/designer/document";
import { fitSceneViewport } from "@/lib/designer/scene";
import { snapValue } from "@/lib/canvas/snap";
import { toWorld } from "@/lib/canvas/viewport";
import { selectCanRedo, selectCanUndo, selectDocument, useDesignerStore } from "@/lib/client/designer-store";
import { useOpenedOnce } from "@/lib/client/use-opened-once";
import { cn } from "@/lib/utils";

const ConfigurationStage = dynamic(
  () => import("@/components/canvas/configuration-stage").then((module) => module.ConfigurationStage),
  { ssr: false, loading: () => <p className="p-4 text-xs text-muted-foreground">Loading the canvas&hellip;</p> },
);
// Loaded when first opened (with ?): no part of the first load.
const ShortcutHelpDialog = dynamic(() => import("./shortcut-help-dialog").then((module) => module.ShortcutHelpDialog));

export interface DesignerCanvasProps {
  result: SpectrumResult | null;
  readOnly?: boolean;
  /** Called by Ctrl/Cmd+S. */
  onSaveShortcut?: () => void;
  /** Opens the paired flip for the one selected stack (button and M). */
  onMoveWorldvolume?: (id: string) => void;
  /** Draw in the light palette whatever the theme (while a PNG is exported). */
  lightPalette?: boolean;
  className?: string;
}

/**
 * The canvas with its toolbar (display axes, zoom, fit, snapping, tools, add, duplicate,
 * delete, undo, redo, help) and the keyboard shortcuts. The react-konva stage loads in the
 * browser only.
 */
export function DesignerCanvas({ result, readOnly = false, onSaveShortcut, onMoveWorldvolume, lightPalette = false, className }: DesignerCanvasProps) {
  const document = useDesignerStore(selectDocument);
  const selection = useDesignerStore((s) => s.selection);
  const displayAxes = useDesignerStore((s) => s.displayAxes);
  const viewport = useDesignerStore((s) => s.viewport);
  const snapping = useDesignerStore((s) => s.snapping);
  const gridStep = useDesignerStore((s) => s.gridStep);
  const tool = useDesignerStore((s) => s.tool);
  const canUndo = useDesignerStore(selectCanUndo);
  const canRedo = useDesignerStore(selectCanRedo);
  const { addStack, deleteStacks, dragStacks, duplicateStacks, endGesture, moveStacks, select, setViewport, setDisplayAxes, setSnapping, setTool, undo, redo } =
    useDesignerStore.getState();

  const frameRef = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ width: 0, height: 0 });
  const [helpOpen, setHelpOpen] = useState(false);
  const helpOpened = useOpenedOnce(helpOpen);

  useEffect(() => {
    const element = frameRef.current;
    if (!element) return;
    const observer = new ResizeObserver(([entry]) => {
      if (!entry) return;
      setSize({ width: Math.floor(entry.contentRect.width), height: Math.floor(entry.contentRect.height) });
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, []);

  useEffect(() => {
    if (viewport === null && size.width > 0 && size.height > 0) {
      setViewport(fitSceneViewport(useDesignerStore.getState().history.present, displayAxes, size.width, size.height));
    }
  }, [viewport, size, displayAxes, setViewport]);

  const zoom = useCallback(
    (factor: number) => {
      const current = useDesignerStore.getState().viewport;
      if (current) setViewport(zoomAt(current, factor, { x: size.width / 2, y: size.height / 2 }));
    },
    [size, setViewport],
  );

  const addAtCentre = useCallback(() => {
    const state = useDesignerStore.getState();
    const current = state.viewport;
    const centre = current ? toWorld({ x: size.width / 2, y: size.height / 2 }, current) : { x: 0, y: 0 };
    const step = state.snapping ? state.gridStep : 0;
    const position = {
      [String(state.displayAxes.horizontal)]: step > 0 ? snapValue(centre.x, step) : centre.x,
      [String(state.displayAxes.vertical)]: step > 0 ? snapValue(centre.y, step) : centre.y,
    };
    addStack({ position, select: true });
  }, [addStack, size]);

  const duplicateSelection = useCallback(() => {
    const state = useDesignerStore.getState();
    if (state.selection.length === 0) return;
    const shift = { [String(state.displayAxes.horizontal)]: state.gridStep * 2, [String(state.displayAxes.vertical)]: state.gridStep * 2 };
    duplicateStacks(state.selection, { shift, select: true });
  }, [duplicateStacks]);

  const deleteSelection = useCallback(() => {
    deleteStacks(useDesignerStore.getState().selection);
  }, [deleteStacks]);

  const moveSelectedWorldvolume = useCallback(() => {
    const [only, ...others] = useDesignerStore.getState().selection;
    if (only !== undefined && others.length === 0) onMoveWorldvolume?.(only);
  }, [onMoveWorldvolume]);

  useEffect(() => {
    function onKeyDown(event: KeyboardEvent) {
      const target = event.target as HTMLElement | null;
      const editable =
        target !== null &&
        (target.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(target.tagName) || target.closest("dialog[open]") !== null);
      const mod = event.metaKey || event.ctrlKey;
      if (mod && event.key.toLowerCase() === "s" && onSaveShortcut) {
        event.preventDefault();
        onSaveShortcut();
        return;
      }
      if (editable) return;
      const canvasFocused = target !== null && frameRef.current?.contains(target) === true;
      // A read-only canvas (the landing demo) leaves the page's own shortcuts alone.
      if (readOnly && !canvasFocused) return;
      const key = event.key;
      if (mod && key.toLowerCase() === "z") {
        event.preventDefault();
        if (readOnly) return;
        if (event.shiftKey) redo();
        else undo();
        return;
      }
      if (mod && key.toLowerCase() === "y") {
        event.preventDefault();
        if (!readOnly) redo();
        return;
      }
      if (mod && key.toLowerCase() === "a") {
        event.preventDefault();
        select(useDesignerStore.getState().history.present.stacks.map((s) => s.id));
        return;
      }
      if (mod || event.altKey) return;
      switch (key) {
        case "?":
          setHelpOpen(true);
          break;
        case "+":
        case "=":
          zoom(1.25);
          break;
        case "-":
        case "_":
          zoom(0.8);
          break;
        case "0":
          setViewport(null);
          break;
        case "g":
        case "G":
          setSnapping(!useDesignerStore.getState().snapping);
          break;
        case "h":
        case "H":
          setTool("pan");
          break;
        case "v":
        case "V":
          setTool("select");
          break;
        case "Escape":
          select([]);
          break;
        case "a":
        case "A":
          if (!readOnly) addAtCentre();
          break;
        case "d":
        case "D":
          if (!readOnly) duplicateSelection();
          break;
        case "m":
        case "M":
          if (!readOnly) moveSelectedWorldvolume();
          break;
        case "Delete":
        case "Backspace":
          if (!readOnly) {
            event.preventDefault();
            deleteSelection();
          }
          break;
        case "ArrowUp":
        case "ArrowDown":
        case "ArrowLeft":
        case "ArrowRight": {
          if (!canvasFocused || readOnly) return;
          const state = useDesignerStore.getState();
          if (state.selection.length === 0) return;
          event.preventDefault();
          const step = state.gridStep * (event.shiftKey ? 4 : 1);
          const dx = key === "ArrowLeft" ? -step : key === "ArrowRight" ? step : 0;
          const dy = key === "ArrowDown" ? -step : key === "ArrowUp" ? step : 0;
          const delta: Record<string, number> = {};
          if (dx !== 0) delta[String(state.displayAxes.horizontal)] = dx;
          if (dy !== 0) delta[String(state.displayAxes.vertical)] = dy;
          moveStacks(state.selection, delta);
          break;
        }
        default:
          return;
      }
    }
    window.addEventListener("keydown", onKeyDown);
    return () => window.removeEventListener("keydown", onKeyDown);
  }, [addAtCentre, deleteSelection, duplicateSelection, moveSelectedWorldvolume, moveStacks, onSaveShortcut, readOnly, redo, select, setSnapping, setTool, setViewport, undo, zoom]);

  const axes = spatialAxes(document);
  const zoomPercent = viewport ? Math.round((viewport.scale / baseScale) * 100) : 100;

  return (
    <section aria-label="Canvas" className={cn("flex min-h-0 flex-col overflow-hidden rounded-lg border border-border bg-surface", className)}>
      <div role="toolbar" aria-label="Canvas tools" className="flex flex-wrap items-center gap-1 border-b border-border px-2 py-1.5 text-xs">
        <AxisSelect
          label="Horizontal"
          shortLabel="Across"
          value={displayAxes.horizontal}
          other={displayAxes.vertical}
          axes={axes}
          onChange={(horizontal) => setDisplayAxes({ ...displayAxes, horizontal })}
        />
        <AxisSelect
          label="Vertical"
          shortLabel="Up"
          value={displayAxes.vertical}
          other={displayAxes.horizontal}
          axes={axes}
          onChange={(vertical) => setDisplayAxes({ ...displayAxes, vertical })}
        />
        <Divider />
        <ToolButton label="Select tool (V)" pressed={tool === "select"} onClick={() => setTool("select")}>
          Select
        </ToolButton>
        <ToolButton label="Pan tool (H)" pressed={tool === "pan"} onClick={() => setTool("pan")}>
          Pan
        </ToolButton>
        <ToolButton label="Snap to grid (G)" pressed={snapping} onClick={() => setSnapping(!snapping)}>
          Snap
        </ToolButton>
        <Divider />
        <ToolButton label="Zoom out (-)" onClick={() => zoom(0.8)}>
          &minus;
        </ToolButton>
        <span className="w-10 text-center font-mono tabular-nums" aria-label="Zoom level">
          {zoomPercent}%
        </span>
        <ToolButton label="Zoom in (+)" onClick={() => zoom(1.25)}>
          +
        </ToolButton>
        <ToolButton label="Fit to view (0)" onClick={() => setViewport(null)}>
          Fit
        </ToolButton>
        {!readOnly ? (
          <>
            <Divider />
            <ToolButton label="Add stack (A)" onClick={addAtCentre}>
              Add
            </ToolButton>
            <ToolButton label="Duplicate selected (D)" onClick={duplicateSelection} disabled={selection.length === 0}>
              Duplicate
            </ToolButton>
            <ToolButton label="Delete selected (Delete)" onClick={deleteSelection} disabled={selection.length === 0}>
              Delete
            </ToolButton>
            {onMoveWorldvolume ? (
              <ToolButton label="Move the worldvolume of the selected stack (M)" onClick={moveSelectedWorldvolume} disabled={selection.length !== 1}>
                Move axis
              </ToolButton>
            ) : null}
            <Divider />
            <ToolButton label="Undo (Ctrl+Z)" onClick={undo} disabled={!canUndo}>
              Undo
            </ToolButton>
            <ToolButton label="Redo (Ctrl+Shift+Z)" onClick={redo} disabled={!canRedo}>
              Redo
            </ToolButton>
          </>
        ) : null}
        <span className="ml-auto" />
        <ToolButton label="Keyboard shortcuts (?)" onClick={() => setHelpOpen(true)}>
          ?
        </ToolButton>
      </div>
      <div
        ref={frameRef}
        tabIndex={0}
        role="application"
        data-designer-canvas=""
        aria-roledescription="brane canvas"
        aria-label={`Canvas showing x${displayAxes.horizontal} across and x${displayAxes.vertical} up${circleNote(document, displayAxes)}. ${selection.length} selected. Arrow keys move the selection; press ? for shortcuts.`}
        className="relative min-h-[280px] flex-1 bg-background focus-visible:outline-2 focus-visible:-outline-offset-2 focus-visible:outline-ring"
      >
        {viewport && size.width > 0 ? (
          <ConfigurationStage
            document={document}
            result={result}
            width={size.width}
            height={size.height}
            displayAxes={displayAxes}
            selection={selection}
            viewport={viewport}
            gridStep={gridStep}
            snapping={snapping}
            tool={tool}
            readOnly={readOnly}
            lightPalette={lightPalette}
            onViewportChange={setViewport}
            onSelect={(ids, mode) => {
              select(ids, mode);
              frameRef.current?.focus({ preventScroll: true });
            }}
            onMove={dragStacks}
            onGestureEnd={endGesture}
          />
        ) : null}
        <CanvasLegend />
      </div>
      {helpOpened ? <ShortcutHelpDialog open={helpOpen} onOpenChange={setHelpOpen} /> : null}
    </section>
  );
}

function CanvasLegend() {
  return (
    <div className="pointer-events-none absolute right-2 bottom-2 rounded border border-border bg-surface/90 px-2 py-1 text-[10px] leading-4 text-muted-foreground">
      <div>&#9679; filled: brane &nbsp; &#9675; hollow / twin rails: antibrane</div>
      <div>&#8212; string, labelled &alpha;&prime;M&sup2; of its lightest state &nbsp; - - - tachyonic</div>
    </div>
  );
}

interface AxisSelectProps {
  label: string;
  /** Visible text; `label` is the accessible name. */
  shortLabel: string;
  value: number;
  /** The axis shown in the other direction (not selectable here). */
  other: number;
  axes: number[];
  onChange: (axis: number) => void;
}

function AxisSelect({ label, shortLabel, value, other, axes, onChange }: AxisSelectProps) {
  return (
    <label className="flex items-center gap-1">
      <span className="text-muted-foreground" aria-hidden="true">
        {shortLabel}
      </span>
      <select
        value={value}
        onChange={(event) => onChange(Number(event.target.value))}
        className="h-7 rounded border border-border-strong bg-surface px-1 font-mono"
        aria-label={`${label} display axis`}
      >
        {axes.map((axis) => (
          <option key={axis} value={axis} disabled={axis === other}>
            x{axis}
          </option>
        ))}
      </select>
    </label>
  );
}

function Divider() {
  return <span aria-hidden="true" className="mx-0.5 h-5 w-px bg-border" />;
}

interface ToolButtonProps {
  label: string;
  pressed?: boolean;
  disabled?: boolean;
  onClick: () => void;
  children: React.ReactNode;
}

function ToolButton({ label, pressed, disabled, onClick, children }: ToolButtonProps) {
  return (
    <button
      type="button"
      title={label}
      aria-label={label}
      aria-pressed={pressed}
      disabled={disabled}
      onClick={onClick}
      className={cn(
        "h-7 min-w-7 rounded px-1.5 font-medium",
        pressed ? "bg-accent-soft text-accent-soft-foreground" : "text-foreground hover:bg-surface-muted",
        "focus-visible:outline-2 focus-visible:outline-ring disabled:opacity-40",
      )}
    >
      {children}
    </button>
  );
}

/** ", x9 a circle of radius 2.5" for the compact display axes, so the canvas's name says what the strips show. */
function circleNote(document: Pick<Configuration, "compact">, axes: DisplayAxes): string {
  return [axes.horizontal, axes.vertical]
    .filter((axis) => document.compact?.[String(axis)] !== undefined)
    .map((axis) => `, x${axis} a circle of radius ${document.compact?.[String(axis)] ?? ""}`)
    .join("");
}
