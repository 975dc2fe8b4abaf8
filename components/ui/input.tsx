import type { ComponentProps } from "react";
import { cn } from "@/lib/utils";

/** Shared look of text-like controls; also used by `Textarea` and `Select`. */
export const controlClassName = cn(
  "block w-full rounded-md border border-border-strong bg-surface px-3 text-sm text-foreground shadow-xs",
  "placeholder:text-muted-foreground/80 transition-colors",
  "focus-visible:outline-2 focus-visible:outline-offset-0 focus-visible:outline-ring focus-visible:border-transparent",
  "disabled:cursor-not-allowed disabled:bg-surface-muted disabled:opacity-70",
  "aria-invalid:border-danger aria-invalid:focus-visible:outline-danger",
);

export type InputProps = ComponentProps<"input">;

export function Input({ className, type = "text", ...props }: InputProps) {
  return <input type={type} className={cn(controlClassName, "h-9", className)} {...props} />;
}
