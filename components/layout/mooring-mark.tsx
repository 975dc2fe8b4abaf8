import { cn } from "@/lib/utils";

/** The Mooring mark: two parallel brane lines joined by an open string. */
export function MooringMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 24 24" fill="none" className={cn("size-6", className)} aria-hidden="true">
      <rect x="1" y="1" width="22" height="22" rx="6" className="fill-accent" />
      <path d="M6.5 5v14M17.5 5v14" className="stroke-accent-foreground" strokeWidth="1.8" strokeLinecap="round" />
      <path d="M6.5 9.5c1.5 7.5 9.5 7.5 11 0" className="stroke-accent-foreground" strokeWidth="1.4" strokeLinecap="round" fill="none" />
    </svg>
  );
}
