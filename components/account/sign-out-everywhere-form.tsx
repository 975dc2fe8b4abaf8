"use client";

import { signOut } from "next-auth/react";
import { useActionState } from "react";
import { signOutEverywhereAction, type SignOutEverywhereState } from "@/app/(workspace)/account/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { idleState } from "@/lib/action-state";
import { useHydrated } from "@/lib/client/use-hydrated";

/** Ends every session of the account on the server, then signs this browser out too. */
export function SignOutEverywhereForm() {
  const hydrated = useHydrated();
  const [state, formAction, pending] = useActionState(async (): Promise<SignOutEverywhereState> => {
    const result = await signOutEverywhereAction();
    if (result.status === "success") await signOut({ callbackUrl: "/sign-in?signedOut=1" });
    return result;
  }, idleState<never>());

  return (
    <form action={formAction} className="grid gap-3">
      {state.status === "error" && state.message ? <Alert variant="danger">{state.message}</Alert> : null}
      <div>
        <Button type="submit" variant="outline" pending={pending} disabled={!hydrated}>
          Sign out of all devices
        </Button>
      </div>
    </form>
  );
}
