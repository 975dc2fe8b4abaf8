import { cloneElement, type ReactElement, type ReactNode } from "react";
import { Label } from "@/components/ui/label";
import { cn } from "@/lib/utils";

interface ControlProps {
  id?: string;
  "aria-describedby"?: string;
  "aria-invalid"?: boolean | "true" | "false";
}

export interface FieldProps {
  /** Id given to the control; the label, hint and error ids derive from it. */
  id: string;
  label: ReactNode;
  /** One control element (Input, Select, Textarea); it receives id, aria-describedby and aria-invalid. */
  children: ReactElement<ControlProps>;
  /** Help text shown under the control. */
  hint?: ReactNode;
  /** Error messages for this field (e.g. zod's flattened field errors); the first is shown. */
  error?: string | readonly string[] | null;
  className?: string;
}

/**
 * A label, one control, optional hint and error text, wired together for assistive technology:
 * the control points at the hint and the error through aria-describedby and is marked aria-invalid.
 */
export function Field({ id, label, children, hint, error, className }: FieldProps) {
  const message = typeof error === "string" ? error : error?.[0];
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = message ? `${id}-error` : undefined;
  const describedBy = [children.props["aria-describedby"], hintId, errorId].filter(Boolean).join(" ") || undefined;

  return (
    <div className={cn("grid gap-1.5", className)}>
      <Label htmlFor={id}>{label}</Label>
      {cloneElement(children, {
        id,
        "aria-describedby": describedBy,
        "aria-invalid": message ? true : children.props["aria-invalid"],
      })}
      {hint ? (
        <p id={hintId} className="text-xs text-muted-foreground">
          {hint}
        </p>
      ) : null}
      <p id={errorId} className={cn("text-xs font-medium text-danger-soft-foreground", !message && "sr-only")} aria-live="polite">
        {message ?? ""}
      </p>
    </div>
  );
}
