import type { Metadata } from "next";
import { AuthPanel } from "@/components/auth/auth-panel";
import { InvalidLinkAlert } from "@/components/auth/invalid-link-alert";
import { ResetPasswordForm } from "@/components/auth/reset-password-form";
import { linkTokenSchema } from "@/lib/validations/auth";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const parsed = linkTokenSchema.safeParse(token);

  return (
    <AuthPanel title="Choose a new password" description="After this, sign in with the new password. Other reset links stop working.">
      {parsed.success ? (
        <ResetPasswordForm token={parsed.data} />
      ) : (
        <InvalidLinkAlert requestHref="/reset-password" />
      )}
    </AuthPanel>
  );
}
