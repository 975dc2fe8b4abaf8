import type { ComponentProps, ReactNode } from "react";
import { cn } from "@/lib/utils";

export type AlertVariant = "info" | "success" | "warning" | "danger";

const variantClasses: Record<AlertVariant, string> = {
  info: "border-accent/30 bg-accent-soft text-accent-soft-foreground",
  success: "border-success/30 bg-success-soft text-success-soft-foreground",
  warning: "border-warning/40 bg-warning-soft text-warning-soft-foreground",
  danger: "border-danger/30 bg-danger-soft text-danger-soft-foreground",
};

export interface AlertProps extends Omit<ComponentProps<"div">, "title"> {
  variant?: AlertVariant;
  title?: ReactNode;
}

/**
 * A message box. Danger alerts use role="alert" so they are announced at once;
 * the others use role="status" so they wait for the reader to finish.
 */
export function Alert({ variant = "info", title, className, children, role, ...props }: AlertProps) {
  return (
    <div
      role={role ?? (variant === "danger" ? "alert" : "status")}
      className={cn("rounded-md border px-4 py-3 text-sm", variantClasses[variant], className)}
      {...props}
    >
      {title ? <p className="font-semibold">{title}</p> : null}
      {children ? <div className={cn(title ? "mt-1" : null, "leading-relaxed")}>{children}</div> : null}
    </div>
  );
}
