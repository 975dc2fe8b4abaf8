import type { Metadata } from "next";
import { ButtonLink } from "@/components/ui/button";

export const metadata: Metadata = { title: "Not found" };

export default function NotFound() {
  return (
    <div className="mx-auto flex max-w-xl flex-col items-start gap-4 px-4 py-20 sm:px-6">
      <p className="font-mono text-sm text-accent">404</p>
      <h1 className="text-2xl font-semibold tracking-tight">This page isn’t here</h1>
      <p className="text-sm leading-relaxed text-muted-foreground">
        The address may be mistyped, the item may have been deleted, or it belongs to a group you are not a member of.
      </p>
      <div className="flex gap-2">
        <ButtonLink href="/dashboard">Go to the dashboard</ButtonLink>
        <ButtonLink href="/" variant="outline">
          Home
        </ButtonLink>
      </div>
    </div>
  );
}
