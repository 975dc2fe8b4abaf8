import Link from "next/link";
import type { ReactNode } from "react";

/** The "← parent" link in a page header's eyebrow. */
export function BackLink({ href, children }: { href: string; children: ReactNode }) {
  return (
    <Link href={href} className="text-accent hover:underline">
      ← {children}
    </Link>
  );
}
