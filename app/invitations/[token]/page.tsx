import type { Metadata } from "next";
import type { ReactNode } from "react";
import Link from "next/link";
import { InvitationResponse } from "@/components/collaboration/invitation-response";
import { PageContainer } from "@/components/layout/page-container";
import { Alert } from "@/components/ui/alert";
import { buttonClassName } from "@/components/ui/button";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { getInvitationPreview, type InvitationPreviewDto } from "@/db/queries/invitations";
import { NotFoundError } from "@/lib/errors";
import { formatDateTime } from "@/lib/format-date";
import { getCurrentUser } from "@/lib/server/session";
import { linkTokenSchema } from "@/lib/validations/auth";
import { withArticle } from "@/lib/wording";

export const metadata: Metadata = { title: "Invitation" };

interface InvitationPageProps {
  params: Promise<{ token: string }>;
}

const deadLinkMessages: Record<Exclude<InvitationPreviewDto["status"], "pending">, { title: string; body: string }> = {
  accepted: { title: "This invitation has been used", body: "It was already accepted. If that was you, the group is on your dashboard." },
  revoked: { title: "This invitation was withdrawn", body: "The group owner revoked it. Ask them for a new one if you still need access." },
  expired: { title: "This invitation has expired", body: "Invitation links work for 7 days. Ask the group owner to send it again." },
};

/** The page an invitation e-mail links to: shows the group and lets the invited person join. */
export default async function InvitationPage({ params }: InvitationPageProps) {
  const { token } = await params;
  const preview = linkTokenSchema.safeParse(token).success
    ? await getInvitationPreview(token).catch((error: unknown) => {
        if (error instanceof NotFoundError) return null;
        throw error;
      })
    : null;
  const user = await getCurrentUser();

  if (!preview) {
    return (
      <InvitationFrame title="Invitation not found">
        <Alert variant="danger">This invitation link is not valid. Copy the whole link from the e-mail, or ask the group owner for a new one.</Alert>
      </InvitationFrame>
    );
  }
  if (preview.status !== "pending") {
    const message = deadLinkMessages[preview.status];
    return (
      <InvitationFrame title={message.title}>
        <Alert variant="warning">{message.body}</Alert>
        <Link href={user ? "/dashboard" : "/sign-in"} className={buttonClassName({ variant: "secondary" })}>
          {user ? "Go to the dashboard" : "Sign in"}
        </Link>
      </InvitationFrame>
    );
  }

  const returnTo = `/invitations/${token}`;
  return (
    <InvitationFrame
      title={`Join ${preview.groupName}`}
      description={`${preview.invitedByName} invited ${preview.email} to this ${preview.groupKind === "lab" ? "lab" : "research group"} as ${withArticle(preview.role)}. The link expires ${formatDateTime(preview.expiresAt)}.`}
    >
      <InvitationResponse
        token={token}
        invitedEmail={preview.email}
        signedInEmail={user?.email ?? null}
        accountExists={preview.accountExists}
        signInHref={`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`}
      />
    </InvitationFrame>
  );
}

function InvitationFrame({ title, description, children }: { title: string; description?: string; children: ReactNode }) {
  return (
    <PageContainer className="grid max-w-lg place-items-stretch">
      <Card>
        <CardHeader>
          <CardTitle>{title}</CardTitle>
          {description ? <CardDescription>{description}</CardDescription> : null}
        </CardHeader>
        <CardContent className="grid gap-4">{children}</CardContent>
      </Card>
    </PageContainer>
  );
}
