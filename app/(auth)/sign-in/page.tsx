import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthPanel } from "@/components/auth/auth-panel";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { toCallbackQuery, toSafeCallbackPath } from "@/lib/safe-redirect";
import { getCurrentUser } from "@/lib/server/session";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const callbackPath = toSafeCallbackPath(params.callbackUrl);
  if (await getCurrentUser()) redirect(callbackPath);
  const query = toCallbackQuery(callbackPath);

  return (
    <AuthPanel
      title="Sign in to Mooring"
      description="Your configurations, groups and results are waiting."
      footer={
        <p>
          No account yet?{" "}
          <Link href={`/sign-up${query}`} className="font-medium text-accent hover:underline">
            Create one
          </Link>
        </p>
      }
    >
      <div className="grid gap-4">
        {params.signedOut ? <Alert variant="info">You have signed out.</Alert> : null}
        {params.reset ? <Alert variant="success">Your password has been changed. Sign in with the new one.</Alert> : null}
        {params.error && !params.reset ? (
          <Alert variant="danger">Signing in did not work. Please try again.</Alert>
        ) : null}
        <SignInForm callbackPath={callbackPath} />
        <div className="flex items-center gap-3 text-xs text-muted-foreground" aria-hidden="true">
          <span className="h-px flex-1 bg-border" />
          or
          <span className="h-px flex-1 bg-border" />
        </div>
        <ButtonLink href="/sign-in/link" variant="outline" className="w-full">
          E-mail me a sign-in link
        </ButtonLink>
      </div>
    </AuthPanel>
  );
}
