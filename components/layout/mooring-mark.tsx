import { cn } from "@/lib/utils";

/** The Mooring mark: two parallel brane lines joined by an open string. */
export function MooringMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 24 24" fill="none" className={cn("size-6", className)} aria-hidden="true">
      <rect x="1" y="1" width="22" height="22" rx="6" className="fill-accent" />
      <path d="M7 5.5v13M17 5.5v13" className="stroke-accent-foreground" strokeWidth="1.8" strokeLinecap="round" />
      <path d="M7 12c2.2-3.2 7.8-3.2 10 0" className="stroke-accent-foreground" strokeWidth="1.5" strokeLinecap="round" />
    </svg>
  );
}
