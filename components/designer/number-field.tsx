"use client";

import { useEffect, useId, useState, type ComponentProps, type KeyboardEvent } from "react";
import { keptValueNote, readNumberInput, type NumberRules } from "@/lib/designer/number-input";
import { cn } from "@/lib/utils";

export interface NumberFieldProps extends Omit<ComponentProps<"input">, "value" | "onChange" | "type" | "step" | "min" | "max"> {
  /** The stored value; null shows an empty field (only with `onClear`). */
  value: number | null;
  /** Called with every valid number typed (live), and on arrow keys. */
  onCommit: (value: number) => void;
  /** Makes the field optional: emptying it calls this (a string scale left out). */
  onClear?: () => void;
  /** The quantity as messages name it ("N", "The position on x9"). */
  name: string;
  step?: number;
  min?: number;
  max?: number;
  integer?: boolean;
  positive?: boolean;
  unit?: string;
  /** How the stored value is written into the field (default `String`). */
  formatValue?: (value: number) => string;
  /** Classes of the wrapper (the input keeps `className`). */
  wrapperClassName?: string;
}

/**
 * A compact numeric text field that keeps what is being typed ("-", "2e") while it is not a
 * number yet, commits every valid value at once and steps with ArrowUp/ArrowDown (Shift: x10).
 * A value it cannot take (N = 0, 2.5, out of range) is explained beside the field, and on leaving
 * the field the explanation says which value stayed, instead of the old value silently coming back.
 */
export function NumberField({
  value,
  onCommit,
  name,
  step = 1,
  min,
  max,
  integer = false,
  positive = false,
  onClear,
  unit,
  formatValue = String,
  className,
  wrapperClassName,
  onBlur,
  onKeyDown,
  ...props
}: NumberFieldProps) {
  const shownValue = value === null ? "" : formatValue(value);
  const [text, setText] = useState(shownValue);
  const [focused, setFocused] = useState(false);
  /** A refused text's explanation, kept after leaving the field until the next edit. */
  const [note, setNote] = useState<string | null>(null);
  const messageId = useId();
  const rules: NumberRules = { name, integer, positive, min, max, unit };

  useEffect(() => {
    if (!focused) setText(shownValue);
  }, [shownValue, focused]);

  const verdict = readNumberInput(text, rules);
  const problem = verdict.kind === "problem" ? verdict.message : null;
  const message = focused ? problem : note;

  function change(next: string) {
    setText(next);
    setNote(null);
    if (next.trim() === "" && onClear) {
      if (value !== null) onClear();
      return;
    }
    const read = readNumberInput(next, rules);
    if (read.kind === "value" && read.value !== value) onCommit(read.value);
  }

  function keyDown(event: KeyboardEvent<HTMLInputElement>) {
    onKeyDown?.(event);
    if (event.defaultPrevented || (event.key !== "ArrowUp" && event.key !== "ArrowDown")) return;
    event.preventDefault();
    if (value === null) return;
    const amount = (event.shiftKey ? 10 : 1) * step * (event.key === "ArrowUp" ? 1 : -1);
    const next = Math.round((value + amount) * 1e10) / 1e10;
    const read = readNumberInput(String(next), rules);
    if (read.kind === "value") {
      onCommit(next);
      setText(String(next));
      setNote(null);
    } else if (read.kind === "problem") {
      setNote(read.message);
    }
  }

  const describedBy = [props["aria-describedby"], message ? messageId : null].filter(Boolean).join(" ") || undefined;
  return (
    <span className={cn("inline-flex flex-col items-start", wrapperClassName)}>
      <input
        {...props}
        type="text"
        inputMode={integer ? "numeric" : "decimal"}
        autoComplete="off"
        spellCheck={false}
        value={text}
        aria-invalid={Boolean(message) || props["aria-invalid"] || undefined}
        aria-describedby={describedBy}
        onFocus={() => setFocused(true)}
        onChange={(event) => change(event.target.value)}
        onKeyDown={keyDown}
        onBlur={(event) => {
          setFocused(false);
          // A refused text gives way to the stored value, and the note says so.
          setNote(problem ? `${problem} ${value === null ? `${name} stays empty.` : keptValueNote(rules, value)}` : null);
          setText(shownValue);
          onBlur?.(event);
        }}
        className={cn(
          "h-7 rounded border border-border-strong bg-surface px-1.5 text-right font-mono text-xs tabular-nums text-foreground",
          "focus-visible:outline-2 focus-visible:outline-offset-0 focus-visible:outline-ring",
          "aria-invalid:border-danger",
          className,
        )}
      />
      {message ? (
        <span id={messageId} role="alert" className="mt-0.5 block w-max max-w-44 text-left text-[11px] leading-tight whitespace-normal text-danger-soft-foreground">
          {message}
        </span>
      ) : null}
    </span>
  );
}
