"use client";

import Link from "next/link";
import { signIn } from "next-auth/react";
import { useActionState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { useHydrated } from "@/lib/client/use-hydrated";

interface LinkState {
  error: string | null;
}

/**
 * Signs in with the token of an e-mailed link. It waits for a click, so mail scanners that open
 * links in advance cannot use up the single-use token.
 */
export function SignInLinkButton({ token }: { token: string }) {
  const hydrated = useHydrated();
  const [state, formAction, pending] = useActionState(async (): Promise<LinkState> => {
    const result = await signIn("email-link", { token, redirect: false });
    if (!result?.ok || result.error) return { error: result?.error ?? "This link is not valid." };
    window.location.assign("/dashboard");
    return { error: null };
  }, { error: null });

  if (state.error) {
    return (
      <div className="grid gap-4">
        <Alert variant="danger" title="This link cannot be used">
          {state.error}
        </Alert>
        <Link href="/sign-in/link" className="text-sm font-medium text-accent hover:underline">
          E-mail me a new sign-in link
        </Link>
      </div>
    );
  }

  return (
    <form action={formAction}>
      <Button type="submit" pending={pending} disabled={!hydrated} className="w-full" autoFocus>
        Sign in to Mooring
      </Button>
    </form>
  );
}
