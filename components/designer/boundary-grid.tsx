"use client";

import { useState, type ReactNode } from "react";
import type { Configuration, Stack } from "@/lib/boundary/types";
import { maxStackCount, maxStacks, renameProblem, spatialAxes } from "@/lib/designer/document";
import { stackKind } from "@/lib/designer/stack-kind";
import type { FieldIssue } from "@/lib/errors";
import { selectDocument, useDesignerStore } from "@/lib/client/designer-store";
import { cn } from "@/lib/utils";
import { Button } from "@/components/ui/button";
import { CompactAxisRow, WilsonLineField, fieldNumber } from "./compact-axis-cells";
import { NumberField } from "./number-field";
import { BoundaryAxisCell } from "./boundary-axis-cell";
import { OrientifoldGrid } from "./orientifold-grid";

export interface BoundaryGridProps {
  /** Problems per stack index (from the same zod schema as the API, and the engine's checks). */
  issuesByStack: Map<number, FieldIssue[]>;
  readOnly?: boolean;
  /** Opens the paired flip ("move the worldvolume from x4 to x6") for a stack. */
  onMoveWorldvolume?: (id: string) => void;
}

/**
 * The accessible equivalent of the canvas: one row per stack, one column per spatial axis
 * (N or D, with the position in D cells), and N, brane/antibrane, label and colour. Every
 * control is a native button or input, so the whole configuration can be built by keyboard.
 */
export function BoundaryGrid({ issuesByStack, readOnly = false, onMoveWorldvolume }: BoundaryGridProps) {
  const document = useDesignerStore(selectDocument);
  const selection = useDesignerStore((s) => s.selection);
  const displayAxes = useDesignerStore((s) => s.displayAxes);
  const { addStack, select } = useDesignerStore.getState();
  const axes = spatialAxes(document);
  const full = document.stacks.length >= maxStacks;

  return (
    <section aria-labelledby="boundary-grid-title" className="flex min-h-0 flex-col gap-2">
      <div className="flex items-center justify-between gap-2">
        <h2 id="boundary-grid-title" className="text-sm font-semibold">
          Boundary grid
          <span className="ml-2 font-normal text-muted-foreground">
            N = Neumann (along the brane), D = Dirichlet (fixed position, in units of &radic;&alpha;&prime;)
          </span>
        </h2>
        {!readOnly ? (
          <div className="flex items-center gap-2">
            {full ? (
              <span id="stack-limit-note" className="text-xs text-muted-foreground">
                {maxStacks} stacks, the most a configuration holds
              </span>
            ) : null}
            <Button size="sm" variant="secondary" onClick={() => addStack()} aria-describedby={full ? "stack-limit-note" : undefined}>
              Add stack
            </Button>
          </div>
        ) : null}
      </div>
      {document.stacks.length === 0 ? (
        <p className="rounded-md border border-dashed border-border-strong px-4 py-6 text-center text-sm text-muted-foreground">
          No stacks yet. {readOnly ? "" : "Add one with the button above, or press A on the canvas."}
        </p>
      ) : (
        // `relative` keeps the visually hidden headings inside the scrolling box: positioned against the
        // page, they would widen it and let a phone scroll sideways into blank space.
        <div className="relative overflow-x-auto rounded-lg border border-border bg-surface" data-testid="boundary-grid-scroller">
          <table className="w-full border-collapse text-xs" aria-describedby="boundary-grid-help">
            <caption id="boundary-grid-help" className="sr-only">
              One row per stack. Each axis cell toggles between Neumann and Dirichlet; Dirichlet cells hold the position, and
              Neumann cells on a circle the Wilson line. The row under the axis names holds each axis&apos;s circle radius and its
              T-duality command.
            </caption>
            <thead className="bg-surface-muted/70 text-muted-foreground">
              <tr>
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">
                  <span className="sr-only">Selected</span>
                </th>
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">Id</th>
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">Label</th>
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">Type</th>
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">N</th>
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">Charge</th>
                {axes.map((axis) => (
                  <th
                    key={axis}
                    scope="col"
                    className={cn(
                      "px-1 py-1.5 text-center font-mono font-semibold",
                      (axis === displayAxes.horizontal || axis === displayAxes.vertical) && "text-accent",
                    )}
                    title={axis === displayAxes.horizontal ? "Horizontal on the canvas" : axis === displayAxes.vertical ? "Vertical on the canvas" : undefined}
                  >
                    x{axis}
                  </th>
                ))}
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">Colour</th>
                <th scope="col" className="px-2 py-1.5 text-left font-semibold">
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
              <CompactAxisRow document={document} axes={axes} leadingColumns={6} trailingColumns={2} readOnly={readOnly} />
            </thead>
            <tbody>
              {document.stacks.map((stack, index) => (
                <StackRows
                  key={stack.id}
                  stack={stack}
                  index={index}
                  document={document}
                  axes={axes}
                  selected={selection.includes(stack.id)}
                  issues={issuesByStack.get(index) ?? []}
                  readOnly={readOnly}
                  onSelect={(on) => select([stack.id], on ? "add" : "toggle")}
                  onMoveWorldvolume={onMoveWorldvolume}
                />
              ))}
            </tbody>
          </table>
        </div>
      )}
      <OrientifoldGrid readOnly={readOnly} />
    </section>
  );
}

interface StackRowsProps {
  stack: Stack;
  index: number;
  document: Configuration;
  axes: number[];
  selected: boolean;
  issues: FieldIssue[];
  readOnly: boolean;
  onSelect: (on: boolean) => void;
  onMoveWorldvolume?: (id: string) => void;
}

function StackRows({ stack, index, document, axes, selected, issues, readOnly, onSelect, onMoveWorldvolume }: StackRowsProps) {
  const { deleteStacks, duplicateStacks, renameStack, setAnti, setColour, setCount, setLabel, setPosition, toggleAxis } =
    useDesignerStore.getState();
  const [idDraft, setIdDraft] = useState(stack.id);
  const idProblem = renameProblem(document, stack.id, idDraft.trim());
  const issueId = `stack-${index}-issues`;
  const describedBy = issues.length > 0 ? issueId : undefined;
  const name = stack.label || stack.id;

  function commitId() {
    const next = idDraft.trim();
    if (idProblem === null && next !== stack.id) renameStack(stack.id, next);
    else setIdDraft(stack.id);
  }

  return (
    <>
      <tr
        className={cn("border-t border-border", selected && "bg-accent-soft/60", issues.length > 0 && "bg-danger-soft/40")}
        aria-invalid={issues.length > 0 || undefined}
      >
        <td className="px-2 py-1">
          <input
            type="checkbox"
            checked={selected}
            onChange={(event) => onSelect(event.target.checked)}
            aria-label={`Select stack ${stack.id}`}
            className="size-3.5 accent-[var(--accent)]"
          />
        </td>
        <td className="px-2 py-1">
          <input
            value={idDraft}
            disabled={readOnly}
            onChange={(event) => setIdDraft(event.target.value)}
            onBlur={commitId}
            onKeyDown={(event) => {
              if (event.key === "Enter") commitId();
              if (event.key === "Escape") setIdDraft(stack.id);
            }}
            aria-label={`Id of stack ${stack.id}`}
            aria-invalid={idProblem !== null || undefined}
            aria-describedby={idProblem ? `${issueId}-id` : describedBy}
            className="h-7 w-16 rounded border border-border-strong bg-surface px-1.5 font-mono text-xs aria-invalid:border-danger"
          />
          {idProblem ? (
            <span id={`${issueId}-id`} role="alert" className="mt-0.5 block max-w-40 text-[11px] text-danger-soft-foreground">
              {idProblem}
            </span>
          ) : null}
        </td>
        <td className="px-2 py-1">
          <input
            value={stack.label}
            disabled={readOnly}
            maxLength={64}
            onChange={(event) => setLabel(stack.id, event.target.value)}
            aria-label={`Label of stack ${stack.id}`}
            className="h-7 w-24 rounded border border-border-strong bg-surface px-1.5 text-xs"
          />
        </td>
        <td className="px-2 py-1 font-mono whitespace-nowrap" aria-label={`Stack ${stack.id} type`}>
          <span data-testid={`stack-kind-${stack.id}`}>{stackKind(stack, document.theory)}</span>
        </td>
        <td className="px-2 py-1">
          <NumberField
            value={stack.count}
            integer
            min={1}
            max={maxStackCount}
            disabled={readOnly}
            onCommit={(count) => setCount(stack.id, count)}
            name="N"
            aria-label={`Number of branes N in stack ${stack.id}`}
            className="w-12"
          />
        </td>
        <td className="px-2 py-1">
          <button
            type="button"
            disabled={readOnly || document.theory === "bosonic"}
            aria-pressed={stack.anti}
            aria-label={`Stack ${stack.id} is an antibrane`}
            title={document.theory === "bosonic" ? "The bosonic theory has no antibranes" : "Switch brane / antibrane"}
            onClick={() => setAnti(stack.id, !stack.anti)}
            className={cn(
              "h-7 rounded border px-2 text-xs font-medium",
              stack.anti ? "border-foreground bg-foreground text-background" : "border-border-strong bg-surface text-foreground",
              "disabled:opacity-50",
            )}
          >
            {stack.anti ? "anti" : "brane"}
          </button>
        </td>
        {axes.map((axis) => {
          const neumann = stack.worldvolume.includes(axis);
          return (
            <BoundaryAxisCell
              key={axis}
              axis={axis}
              neumann={neumann}
              position={stack.position[String(axis)] ?? 0}
              readOnly={readOnly}
              toggleLabel={`Stack ${stack.id}, axis x${axis}: ${neumann ? "Neumann" : "Dirichlet"}`}
              title={`Make x${axis} ${neumann ? "Dirichlet" : "Neumann"} for ${name}`}
              positionLabel={`Position of stack ${stack.id} on x${axis}`}
              describedBy={describedBy}
              formatValue={fieldNumber}
              onToggle={() => toggleAxis(stack.id, axis)}
              onCommit={(value) => setPosition(stack.id, axis, value)}
            >
              {neumann && document.compact?.[String(axis)] !== undefined ? (
                <WilsonLineField stack={stack} axis={axis} readOnly={readOnly} />
              ) : null}
            </BoundaryAxisCell>
          );
        })}
        <td className="px-2 py-1">
          <input
            type="color"
            value={stack.colour ?? "#2f6f9f"}
            disabled={readOnly}
            onChange={(event) => setColour(stack.id, event.target.value)}
            aria-label={`Colour of stack ${stack.id}`}
            className="h-7 w-8 cursor-pointer rounded border border-border-strong bg-surface p-0.5"
          />
        </td>
        <td className="px-2 py-1 whitespace-nowrap">
          {!readOnly ? (
            <div className="flex gap-0.5">
              {onMoveWorldvolume ? (
                <RowAction label={`Move the worldvolume of stack ${stack.id}`} title="Move the worldvolume to another axis (keeps p)" onClick={() => onMoveWorldvolume(stack.id)}>
                  <path d="M2 5h10l-2.5-2.5M14 11H4l2.5 2.5" />
                </RowAction>
              ) : null}
              <RowAction label={`Duplicate stack ${stack.id}`} title="Duplicate" onClick={() => duplicateStacks([stack.id])}>
                <rect x="5" y="5" width="8.5" height="8.5" rx="1.5" />
                <path d="M10.5 5V3.5A1.5 1.5 0 0 0 9 2H3.5A1.5 1.5 0 0 0 2 3.5V9a1.5 1.5 0 0 0 1.5 1.5H5" />
              </RowAction>
              <RowAction label={`Delete stack ${stack.id}`} title="Delete" danger onClick={() => deleteStacks([stack.id])}>
                <path d="M2.5 4h11M6 4V2.5h4V4M4 4l.7 9.5h6.6L12 4" />
              </RowAction>
            </div>
          ) : null}
        </td>
      </tr>
      {issues.length > 0 ? (
        <tr>
          <td colSpan={axes.length + 8} className="px-3 pb-2">
            {/* Sticky and no wider than the scrolling box, so a long message stays in view in a wide table. */}
            <ul id={issueId} role="alert" className="sticky left-3 max-w-[min(100%,calc(100vw_-_4rem))] space-y-0.5 text-xs text-danger-soft-foreground">
              {issues.map((issue) => (
                <li key={`${issue.path.join(".")}-${issue.message}`}>{issue.message}</li>
              ))}
            </ul>
          </td>
        </tr>
      ) : null}
    </>
  );
}

interface RowActionProps {
  label: string;
  title: string;
  danger?: boolean;
  onClick: () => void;
  /** The icon's SVG shapes (16 x 16, stroked). */
  children: ReactNode;
}

function RowAction({ label, title, danger = false, onClick, children }: RowActionProps) {
  return (
    <button
      type="button"
      onClick={onClick}
      aria-label={label}
      title={title}
      className={cn(
        "grid size-7 place-items-center rounded",
        danger ? "text-danger-soft-foreground hover:bg-danger-soft" : "text-muted-foreground hover:bg-surface-muted hover:text-foreground",
      )}
    >
      <svg width="14" height="14" viewBox="0 0 16 16" fill="none" stroke="currentColor" strokeWidth="1.5" aria-hidden="true">
        {children}
      </svg>
    </button>
  );
}
