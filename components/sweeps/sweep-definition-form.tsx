"use client";

import { useRouter } from "next/navigation";
import { useId, useMemo, useState, type FormEvent } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/input";
import { Label } from "@/components/ui/label";
import { Select } from "@/components/ui/select";
import { compactLimits, dimensionOf } from "@/lib/boundary";
import type { Configuration } from "@/lib/boundary/types";
import { ApiError } from "@/lib/client/api-client";
import { useStartSweep, type SuggestedSweepJson } from "@/lib/client/sweeps";
import { checkSweepDefinition, formatPointCount, sweepLimits, sweepPointCount, type SweepDimensionKind, type SweepProblem } from "@/lib/sweeps";
import { draftToDefinition, firstValues, newDimensionDraft, toDimensionDraft, type DimensionDraft, type ValuesDraft } from "@/lib/sweeps/form-draft";
import { formatJsonPath } from "@/lib/errors";

export interface SweepDefinitionFormProps {
  configurationId: string;
  /** The saved document the sweep varies. */
  base: Configuration;
  /** A lab starter can offer the sweep to students who fork it. */
  isStarter: boolean;
  suggested: SuggestedSweepJson[];
}

const kindLabels: Record<SweepDimensionKind, string> = {
  position: "Position (separation)",
  boundary: "N/D choice on axes",
  count: "Count N",
  orientation: "Brane / antibrane",
  radius: "Compact radius R",
};

/** Defines a sweep of the saved revision dimension by dimension, shows its point count, and starts it. */
export function SweepDefinitionForm({ configurationId, base, isStarter, suggested }: SweepDefinitionFormProps) {
  const router = useRouter();
  const start = useStartSweep(configurationId);
  const [drafts, setDrafts] = useState<DimensionDraft[]>(() => [newDimensionDraft(base, "position")]);
  const [title, setTitle] = useState("");
  const [attach, setAttach] = useState(false);
  const [newKind, setNewKind] = useState<SweepDimensionKind>("position");

  const { definition, problems } = useMemo(() => {
    const read = draftToDefinition(drafts);
    return { definition: read.definition, problems: [...read.problems, ...checkSweepDefinition(base, read.definition)] };
  }, [drafts, base]);
  const count = useMemo(() => {
    try {
      return sweepPointCount(definition);
    } catch {
      // A number of values that is not a whole number has no count; its problem is shown at the field.
      return null;
    }
  }, [definition]);
  const serverIssues = start.error instanceof ApiError ? start.error.issues : [];

  const update = (index: number, draft: DimensionDraft) => setDrafts((current) => current.map((item, i) => (i === index ? draft : item)));
  const remove = (index: number) => setDrafts((current) => current.filter((_item, i) => i !== index));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (problems.length > 0) return;
    start.mutate(
      { definition, title: title.trim() || undefined, attachToStarter: isStarter && attach ? true : undefined },
      { onSuccess: (sweep) => router.push(`/configurations/${configurationId}/sweeps/${sweep.id}`) },
    );
  };

  const applySuggested = (sweep: SuggestedSweepJson) => {
    setDrafts(sweep.definition.dimensions.map(toDimensionDraft));
    setTitle(sweep.title);
  };

  return (
    <form onSubmit={submit} className="grid gap-5" aria-labelledby="new-sweep-title" noValidate>
      {suggested.length > 0 ? (
        <Alert variant="info" title="Suggested by your lab">
          <ul className="grid gap-1">
            {suggested.map((sweep) => (
              <li key={sweep.id} className="flex flex-wrap items-center gap-2">
                <span>
                  {sweep.title || "Untitled sweep"} <span className="text-muted-foreground">(on the starter “{sweep.starterTitle}”)</span>
                </span>
                <Button size="sm" variant="secondary" onClick={() => applySuggested(sweep)}>
                  Use this sweep
                </Button>
              </li>
            ))}
          </ul>
        </Alert>
      ) : null}

      <ol className="grid gap-4">
        {drafts.map((draft, index) => (
          <li key={index} className="grid gap-3 rounded-lg border border-border bg-surface p-4">
            <div className="flex items-center justify-between gap-2">
              <h3 className="text-sm font-semibold">
                Dimension {index + 1}: {kindLabels[draft.kind]}
              </h3>
              <Button size="sm" variant="ghost" onClick={() => remove(index)} aria-label={`Remove dimension ${index + 1}`}>
                Remove
              </Button>
            </div>
            <DimensionEditor index={index} draft={draft} base={base} onChange={(next) => update(index, next)} problems={problems} />
          </li>
        ))}
      </ol>

      <div className="flex flex-wrap items-end gap-2">
        <div className="grid gap-1.5">
          <Label htmlFor="new-dimension-kind">Add a dimension</Label>
          <Select id="new-dimension-kind" value={newKind} onChange={(event) => setNewKind(event.target.value as SweepDimensionKind)} className="w-56">
            {(Object.keys(kindLabels) as SweepDimensionKind[]).map((kind) => (
              <option key={kind} value={kind}>
                {kindLabels[kind]}
              </option>
            ))}
          </Select>
        </div>
        <Button
          variant="secondary"
          onClick={() => setDrafts((current) => [...current, newDimensionDraft(base, newKind)])}
          disabled={drafts.length >= sweepLimits.maxDimensions}
        >
          Add
        </Button>
      </div>

      <div className="grid gap-1.5 sm:max-w-md">
        <Label htmlFor="sweep-title">Title (optional)</Label>
        <Input id="sweep-title" value={title} maxLength={200} onChange={(event) => setTitle(event.target.value)} placeholder="e.g. where the pair turns tachyonic" />
      </div>
      {isStarter ? (
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={attach} onChange={(event) => setAttach(event.target.checked)} />
          Offer this sweep to students who fork the starter
        </label>
      ) : null}

      <p className="text-sm" aria-live="polite" id="sweep-point-count">
        {count === null ? (
          "Fix the problems above to see the number of points."
        ) : (
          <>
            <strong className="font-semibold">{formatPointCount(count)}</strong> {count === 1n ? "point" : "points"} (at most {formatPointCount(sweepLimits.maxPoints)}). Each
            point is the saved revision with these values; α′ = 1, positions and radii in units of √α′.
          </>
        )}
      </p>
      {problems.filter((problem) => problem.path.length <= 2).map((problem) => (
        <Alert key={problem.message} variant="danger">
          {problem.message}
        </Alert>
      ))}
      {start.error ? (
        <Alert variant="danger" title="The sweep did not start">
          {start.error.message}
          {serverIssues.length > 1 ? (
            <ul className="mt-1 list-disc pl-5">
              {serverIssues.map((issue) => (
                <li key={`${formatJsonPath(issue.path)}:${issue.message}`}>{issue.message}</li>
              ))}
            </ul>
          ) : null}
        </Alert>
      ) : null}
      <div>
        <Button type="submit" pending={start.isPending} disabled={problems.length > 0 || drafts.length === 0} aria-describedby="sweep-point-count">
          Start sweep
        </Button>
      </div>
    </form>
  );
}

interface DimensionEditorProps {
  index: number;
  draft: DimensionDraft;
  base: Configuration;
  onChange: (draft: DimensionDraft) => void;
  problems: SweepProblem[];
}

function DimensionEditor({ index, draft, base, onChange, problems }: DimensionEditorProps) {
  const id = useId();
  const axes = Array.from({ length: dimensionOf(base) - 1 }, (_unused, i) => i + 1);
  const errorAt = (...rest: (string | number)[]) => {
    const prefix = formatJsonPath(["dimensions", index, ...rest]);
    return problems.filter((problem) => formatJsonPath(problem.path).startsWith(prefix)).map((problem) => problem.message);
  };
  const stackSelect = (stack: string, onStack: (next: string) => void) => (
    <div className="grid gap-1.5">
      <Label htmlFor={`${id}-stack`}>Stack</Label>
      <Select id={`${id}-stack`} value={stack} onChange={(event) => onStack(event.target.value)} className="w-48">
        {base.stacks.map((item) => (
          <option key={item.id} value={item.id}>
            {item.label ? `${item.id} (${item.label})` : item.id}
          </option>
        ))}
      </Select>
    </div>
  );
  const axisSelect = (label: string, axis: number, onAxis: (next: number) => void) => (
    <div className="grid gap-1.5">
      <Label htmlFor={`${id}-axis`}>{label}</Label>
      <Select id={`${id}-axis`} value={String(axis)} onChange={(event) => onAxis(Number(event.target.value))} className="w-24">
        {axes.map((item) => (
          <option key={item} value={item}>
            x{item}
          </option>
        ))}
      </Select>
    </div>
  );
  const own = errorAt();

  let body;
  switch (draft.kind) {
    case "position":
      body = (
        <div className="flex flex-wrap items-end gap-3">
          {stackSelect(draft.stack, (stack) => onChange({ ...draft, stack }))}
          {axisSelect("Axis", draft.axis, (axis) => onChange({ ...draft, axis }))}
          <ValuesEditor id={id} values={draft.values} onChange={(values) => onChange({ ...draft, values })} unit="√α′" />
        </div>
      );
      break;
    case "count":
      body = (
        <div className="flex flex-wrap items-end gap-3">
          {stackSelect(draft.stack, (stack) => onChange({ ...draft, stack }))}
          <ValuesEditor id={id} values={draft.values} onChange={(values) => onChange({ ...draft, values })} unit="branes" />
        </div>
      );
      break;
    case "orientation":
      body = (
        <div className="flex flex-wrap items-end gap-3">
          {stackSelect(draft.stack, (stack) => onChange({ ...draft, stack }))}
          <p className="pb-2 text-sm text-muted-foreground">Two values: brane, then antibrane.</p>
        </div>
      );
      break;
    case "radius": {
      const current = base.compact?.[String(draft.axis)];
      body = (
        <div className="grid gap-2">
          <div className="flex flex-wrap items-end gap-3">
            {axisSelect("Compact axis", draft.axis, (axis) => onChange({ ...draft, axis }))}
            <ValuesEditor id={id} values={draft.values} onChange={(values) => onChange({ ...draft, values })} unit="√α′" fresh={firstValues.radius} />
          </div>
          <p className="text-xs text-muted-foreground">
            {current === undefined
              ? `x${draft.axis} is not compact in the saved revision: each point puts it on a circle of radius R (file format 2).`
              : `x${draft.axis} is a circle of radius ${current} in the saved revision; each point replaces that radius.`}{" "}
            Radii from {compactLimits.minRadius} to {compactLimits.maxRadius}.
            {(base.orientifolds?.length ?? 0) > 0 ? " This configuration has an orientifold plane, which the engine does not combine with compact axes: every point will be invalid." : ""}
          </p>
        </div>
      );
      break;
    }
    case "boundary":
      body = (
        <div className="grid gap-3">
          <fieldset className="grid gap-1.5">
            <legend className="text-sm font-medium">Stacks</legend>
            <div className="flex flex-wrap gap-3">
              {base.stacks.map((item) => (
                <label key={item.id} className="flex items-center gap-1.5 text-sm">
                  <input
                    type="checkbox"
                    checked={draft.stacks.includes(item.id)}
                    onChange={(event) =>
                      onChange({
                        ...draft,
                        stacks: event.target.checked
                          ? base.stacks.map((stack) => stack.id).filter((stackId) => stackId === item.id || draft.stacks.includes(stackId))
                          : draft.stacks.filter((stackId) => stackId !== item.id),
                      })
                    }
                  />
                  {item.id}
                </label>
              ))}
            </div>
          </fieldset>
          <fieldset className="grid gap-1.5">
            <legend className="text-sm font-medium">Axes (each chosen stack is N or D on each)</legend>
            <div className="flex flex-wrap gap-3">
              {axes.map((axis) => (
                <label key={axis} className="flex items-center gap-1.5 font-mono text-sm">
                  <input
                    type="checkbox"
                    checked={draft.axes.includes(axis)}
                    onChange={(event) =>
                      onChange({
                        ...draft,
                        axes: event.target.checked ? [...draft.axes, axis].sort((a, b) => a - b) : draft.axes.filter((item) => item !== axis),
                      })
                    }
                  />
                  x{axis}
                </label>
              ))}
            </div>
          </fieldset>
          <div className="grid gap-1.5 sm:max-w-md">
            <Label htmlFor={`${id}-symmetry`}>Choices</Label>
            <Select id={`${id}-symmetry`} value={draft.symmetry} onChange={(event) => onChange({ ...draft, symmetry: event.target.value === "all" ? "all" : "relabel-axes" })}>
              <option value="relabel-axes">Up to relabelling the chosen axes (one choice per pattern)</option>
              <option value="all">Every assignment</option>
            </Select>
            <p className="text-xs text-muted-foreground">
              Relabelling counts choices that differ only by a permutation of the chosen axes once; that is exact when the stacks sit alike on those axes.
              Choices the theory forbids (odd p in IIA, even p in IIB) are kept as points the engine refuses.
            </p>
          </div>
        </div>
      );
      break;
  }
  return (
    <div className="grid gap-2">
      {body}
      {own.length > 0 ? (
        <ul className="grid gap-0.5 text-xs font-medium text-danger-soft-foreground" aria-live="polite">
          {own.map((message) => (
            <li key={message}>{message}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

interface ValuesEditorProps {
  id: string;
  values: ValuesDraft;
  onChange: (values: ValuesDraft) => void;
  unit: string;
  fresh?: { list: ValuesDraft; range: ValuesDraft };
}

function ValuesEditor({ id, values, onChange, unit, fresh = firstValues.position }: ValuesEditorProps) {
  return (
    <>
      <div className="grid gap-1.5">
        <Label htmlFor={`${id}-mode`}>Values</Label>
        <Select
          id={`${id}-mode`}
          value={values.mode}
          onChange={(event) => onChange(event.target.value === "list" ? fresh.list : fresh.range)}
          className="w-32"
        >
          <option value="range">Range</option>
          <option value="list">List</option>
        </Select>
      </div>
      {values.mode === "range" ? (
        <>
          <NumberText id={`${id}-from`} label={`From (${unit})`} value={values.from} onChange={(from) => onChange({ ...values, from })} />
          <NumberText id={`${id}-to`} label={`To (${unit})`} value={values.to} onChange={(to) => onChange({ ...values, to })} />
          <NumberText id={`${id}-steps`} label="Number of values" value={values.steps} onChange={(steps) => onChange({ ...values, steps })} />
        </>
      ) : (
        <div className="grid gap-1.5">
          <Label htmlFor={`${id}-list`}>List ({unit}, comma-separated)</Label>
          <Input id={`${id}-list`} value={values.text} onChange={(event) => onChange({ ...values, text: event.target.value })} className="w-64 font-mono" />
        </div>
      )}
    </>
  );
}

function NumberText({ id, label, value, onChange }: { id: string; label: string; value: string; onChange: (value: string) => void }) {
  return (
    <div className="grid gap-1.5">
      <Label htmlFor={id}>{label}</Label>
      <Input id={id} inputMode="decimal" value={value} onChange={(event) => onChange(event.target.value)} className="w-28 font-mono" />
    </div>
  );
}
