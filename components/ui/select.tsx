import type { ComponentProps } from "react";
import { cn } from "@/lib/utils";
import { controlClassName } from "@/components/ui/input";

export type SelectProps = ComponentProps<"select">;

/** A native select styled like `Input`; native keeps keyboard and screen-reader behaviour for free. */
export function Select({ className, children, ...props }: SelectProps) {
  return (
    <select className={cn(controlClassName, "h-9 appearance-none bg-no-repeat pr-8", className)} style={chevron} {...props}>
      {children}
    </select>
  );
}

const chevron = {
  backgroundImage:
    "url(\"data:image/svg+xml,%3Csvg xmlns='http://www.w3.org/2000/svg' viewBox='0 0 16 16' fill='none' stroke='%23808a99' stroke-width='1.5'%3E%3Cpath d='M4 6l4 4 4-4'/%3E%3C/svg%3E\")",
  backgroundPosition: "right 0.6rem center",
  backgroundSize: "1rem",
} as const;
