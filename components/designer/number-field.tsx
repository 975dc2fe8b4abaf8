"use client";

import { useEffect, useState, type ComponentProps, type KeyboardEvent } from "react";
import { cn } from "@/lib/utils";

export interface NumberFieldProps extends Omit<ComponentProps<"input">, "value" | "onChange" | "type" | "step" | "min" | "max"> {
  value: number;
  /** Called with every valid number typed (live), and on arrow keys. */
  onCommit: (value: number) => void;
  step?: number;
  min?: number;
  max?: number;
  integer?: boolean;
}

/**
 * A compact numeric text field that keeps what is being typed ("-", "1.") while it is not a
 * number yet, commits every valid value at once, steps with ArrowUp/ArrowDown (Shift: x10)
 * and falls back to the stored value on blur.
 */
export function NumberField({ value, onCommit, step = 1, min, max, integer = false, className, onBlur, onKeyDown, ...props }: NumberFieldProps) {
  const [text, setText] = useState(String(value));
  const [focused, setFocused] = useState(false);

  useEffect(() => {
    if (!focused) setText(String(value));
  }, [value, focused]);

  function accept(candidate: number): boolean {
    if (!Number.isFinite(candidate)) return false;
    if (integer && !Number.isInteger(candidate)) return false;
    if (min !== undefined && candidate < min) return false;
    if (max !== undefined && candidate > max) return false;
    return true;
  }

  function change(next: string) {
    setText(next);
    const trimmed = next.trim();
    if (trimmed === "" || !/^-?(\d+\.?\d*|\.\d+)(e-?\d+)?$/i.test(trimmed)) return;
    const parsed = Number(trimmed);
    if (accept(parsed) && parsed !== value) onCommit(parsed);
  }

  function keyDown(event: KeyboardEvent<HTMLInputElement>) {
    onKeyDown?.(event);
    if (event.defaultPrevented || (event.key !== "ArrowUp" && event.key !== "ArrowDown")) return;
    event.preventDefault();
    const amount = (event.shiftKey ? 10 : 1) * step * (event.key === "ArrowUp" ? 1 : -1);
    const next = Math.round((value + amount) * 1e10) / 1e10;
    if (accept(next)) {
      onCommit(next);
      setText(String(next));
    }
  }

  const invalid = text.trim() !== "" && text.trim() !== String(value) && !accept(Number(text));
  return (
    <input
      {...props}
      type="text"
      inputMode={integer ? "numeric" : "decimal"}
      autoComplete="off"
      spellCheck={false}
      value={text}
      aria-invalid={invalid || props["aria-invalid"] || undefined}
      onFocus={() => setFocused(true)}
      onChange={(event) => change(event.target.value)}
      onKeyDown={keyDown}
      onBlur={(event) => {
        setFocused(false);
        setText(String(value));
        onBlur?.(event);
      }}
      className={cn(
        "h-7 rounded border border-border-strong bg-surface px-1.5 text-right font-mono text-xs tabular-nums text-foreground",
        "focus-visible:outline-2 focus-visible:outline-offset-0 focus-visible:outline-ring",
        "aria-invalid:border-danger",
        className,
      )}
    />
  );
}
