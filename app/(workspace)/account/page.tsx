import type { Metadata } from "next";
import Link from "next/link";
import { AccountNameForm } from "@/components/account/account-name-form";
import { ApiTokenList } from "@/components/account/api-token-list";
import { ChangePasswordForm } from "@/components/account/change-password-form";
import { CreateApiTokenForm } from "@/components/account/create-api-token-form";
import { SignOutEverywhereForm } from "@/components/account/sign-out-everywhere-form";
import { RoleBadge } from "@/components/dashboard/role-badge";
import { PageContainer } from "@/components/layout/page-container";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { listApiTokens, type ApiTokenDto } from "@/db/queries/api-tokens";
import { getAccount } from "@/db/queries/users";
import { formatDate } from "@/lib/format-date";
import { requireUser } from "@/lib/server/session";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const user = await requireUser("/account");
  const [account, tokens] = await Promise.all([getAccount(user), listApiTokens(user)]);
  const now = Date.now();

  return (
    <PageContainer>
      <div className="grid max-w-3xl gap-6">
        <PageHeader title="Account" description="Your name, sign-in details and role on this Mooring site." />
        <Card aria-labelledby="account-details-title">
          <CardHeader>
            <CardTitle id="account-details-title">Details</CardTitle>
          </CardHeader>
          <CardContent>
            <dl className="grid gap-x-6 gap-y-3 text-sm sm:grid-cols-[10rem_1fr]">
              <dt className="text-muted-foreground">E-mail</dt>
              <dd className="font-medium">
                {account.email}
                {account.emailVerifiedAt ? null : <span className="ml-2 text-xs font-normal text-muted-foreground">(not yet confirmed)</span>}
              </dd>
              <dt className="text-muted-foreground">Site role</dt>
              <dd>
                <RoleBadge role={account.siteRole} />
                <span className="ml-2 text-muted-foreground">
                  {account.siteRole === "admin" ? "You can manage accounts and roles." : "Group roles are set by each group's owners."}
                </span>
              </dd>
              <dt className="text-muted-foreground">Member since</dt>
              <dd>{formatDate(account.createdAt)}</dd>
            </dl>
          </CardContent>
        </Card>
        <Card aria-labelledby="account-name-title">
          <CardHeader>
            <CardTitle id="account-name-title">Name</CardTitle>
            <CardDescription>Shown to your collaborators beside revisions and comments.</CardDescription>
          </CardHeader>
          <CardContent>
            <AccountNameForm name={account.name} />
          </CardContent>
        </Card>
        <Card aria-labelledby="account-password-title">
          <CardHeader>
            <CardTitle id="account-password-title">Password</CardTitle>
            <CardDescription>You can always sign in with an e-mailed link as well.</CardDescription>
          </CardHeader>
          <CardContent>
            <ChangePasswordForm hasPassword={account.hasPassword} />
          </CardContent>
        </Card>
        <Card aria-labelledby="account-tokens-title">
          <CardHeader>
            <CardTitle id="account-tokens-title">API tokens</CardTitle>
            <CardDescription>
              Scripts use a token to read configurations, compute spectra and, with write access, save revisions as you. A token acts
              with your current rights and stops working when it expires or is revoked.{" "}
              <Link href="/docs/api" className="text-accent underline-offset-2 hover:underline">
                API reference
              </Link>
            </CardDescription>
          </CardHeader>
          <CardContent className="grid gap-6">
            <CreateApiTokenForm />
            <ApiTokenList tokens={tokens.map((token) => ({ ...token, status: statusOf(token, now) }))} />
          </CardContent>
        </Card>
        <Card aria-labelledby="account-sessions-title">
          <CardHeader>
            <CardTitle id="account-sessions-title">Signed-in devices</CardTitle>
            <CardDescription>
              Signs out every browser and device where this account is signed in, this one included. Changing or resetting the
              password does the same for the other devices.
            </CardDescription>
          </CardHeader>
          <CardContent>
            <SignOutEverywhereForm />
          </CardContent>
        </Card>
      </div>
    </PageContainer>
  );
}

function statusOf(token: ApiTokenDto, now: number): "live" | "expired" | "revoked" {
  if (token.revokedAt) return "revoked";
  return token.expiresAt.getTime() <= now ? "expired" : "live";
}
