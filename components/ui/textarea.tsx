import type { ComponentProps } from "react";
import { cn } from "@/lib/utils";
import { controlClassName } from "@/components/ui/input";

export type TextareaProps = ComponentProps<"textarea">;

export function Textarea({ className, rows = 4, ...props }: TextareaProps) {
  return <textarea rows={rows} className={cn(controlClassName, "py-2 leading-relaxed", className)} {...props} />;
}
