import type { ComponentProps } from "react";
import { cn } from "@/lib/utils";

/** The standard width and padding of a workspace page. */
export function PageContainer({ className, ...props }: ComponentProps<"div">) {
  return <div className={cn("mx-auto w-full max-w-7xl px-4 py-8 sm:px-6", className)} {...props} />;
}
