import type { Metadata } from "next";
import Link from "next/link";
import { AuthPanel } from "@/components/auth/auth-panel";
import { InvalidLinkAlert } from "@/components/auth/invalid-link-alert";
import { SignInLinkButton } from "@/components/auth/sign-in-link-button";
import { linkTokenSchema } from "@/lib/validations/auth";

export const metadata: Metadata = { title: "Sign in with a link" };

export default async function SignInLinkPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const parsed = linkTokenSchema.safeParse(token);

  return (
    <AuthPanel
      title="Sign in with your link"
      description="The link works once. Continue to sign in on this device."
      footer={
        <p>
          <Link href="/sign-in" className="font-medium text-accent hover:underline">
            Sign in with a password instead
          </Link>
        </p>
      }
    >
      {parsed.success ? (
        <SignInLinkButton token={parsed.data} />
      ) : (
        <InvalidLinkAlert requestHref="/sign-in/link" />
      )}
    </AuthPanel>
  );
}
