import type { Metadata } from "next";
import Link from "next/link";
import { requestPasswordResetAction } from "@/app/(auth)/actions";
import { AuthPanel } from "@/components/auth/auth-panel";
import { EmailRequestForm } from "@/components/auth/email-request-form";

export const metadata: Metadata = { title: "Reset your password" };

export default function ResetPasswordRequestPage() {
  return (
    <AuthPanel
      title="Reset your password"
      description="Enter the e-mail of your account and we'll send a link to choose a new password."
      footer={
        <p>
          Remembered it?{" "}
          <Link href="/sign-in" className="font-medium text-accent hover:underline">
            Sign in
          </Link>
        </p>
      }
    >
      <EmailRequestForm action={requestPasswordResetAction} submitLabel="Send the reset link" />
    </AuthPanel>
  );
}
