import type { Metadata } from "next";
import { AuthPanel } from "@/components/auth/auth-panel";
import { ConfirmSignUpForm } from "@/components/auth/confirm-sign-up-form";
import { InvalidLinkAlert } from "@/components/auth/invalid-link-alert";
import { getPendingSignUp } from "@/db/queries/users";
import { toSafeCallbackPath } from "@/lib/safe-redirect";
import { linkTokenSchema } from "@/lib/validations/auth";

export const metadata: Metadata = { title: "Finish creating your account" };

export default async function ConfirmSignUpPage({
  params,
  searchParams,
}: {
  params: Promise<{ token: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const [{ token }, query] = await Promise.all([params, searchParams]);
  const parsed = linkTokenSchema.safeParse(token);
  const pending = parsed.success ? await getPendingSignUp(null, parsed.data) : null;

  return (
    <AuthPanel title="Finish creating your account" description="Your address is confirmed by this link; enter your password to finish.">
      {parsed.success && pending ? (
        <ConfirmSignUpForm token={parsed.data} email={pending.email} callbackPath={toSafeCallbackPath(query.callbackUrl)} />
      ) : (
        <InvalidLinkAlert requestHref="/sign-up" />
      )}
    </AuthPanel>
  );
}
