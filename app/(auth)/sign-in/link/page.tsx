import type { Metadata } from "next";
import Link from "next/link";
import { requestSignInLinkAction } from "@/app/(auth)/actions";
import { AuthPanel } from "@/components/auth/auth-panel";
import { EmailRequestForm } from "@/components/auth/email-request-form";

export const metadata: Metadata = { title: "E-mail a sign-in link" };

export default function SignInLinkRequestPage() {
  return (
    <AuthPanel
      title="Sign in with an e-mail link"
      description="We'll e-mail you a link that signs you in once, without a password."
      footer={
        <p>
          <Link href="/sign-in" className="font-medium text-accent hover:underline">
            Back to sign-in with a password
          </Link>
        </p>
      }
    >
      <EmailRequestForm action={requestSignInLinkAction} submitLabel="E-mail me a link" />
    </AuthPanel>
  );
}
