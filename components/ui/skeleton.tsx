import type { ComponentProps } from "react";
import { cn } from "@/lib/utils";

/** A placeholder block shown while data loads; decorative, so hidden from assistive technology. */
export function Skeleton({ className, ...props }: ComponentProps<"div">) {
  return <div aria-hidden="true" className={cn("animate-pulse rounded-md bg-border/70", className)} {...props} />;
}
