import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { AuthPanel } from "@/components/auth/auth-panel";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { toCallbackQuery, toSafeCallbackPath } from "@/lib/safe-redirect";
import { getCurrentUser } from "@/lib/server/session";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const callbackPath = toSafeCallbackPath((await searchParams).callbackUrl);
  if (await getCurrentUser()) redirect(callbackPath);
  const query = toCallbackQuery(callbackPath);

  return (
    <AuthPanel
      title="Create your Mooring account"
      description="You get a personal space for your configurations; groups and labs can invite you later."
      footer={
        <p>
          Already have an account?{" "}
          <Link href={`/sign-in${query}`} className="font-medium text-accent hover:underline">
            Sign in
          </Link>
        </p>
      }
    >
      <SignUpForm callbackPath={callbackPath} />
    </AuthPanel>
  );
}
