import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { LinkedText } from "@/components/admin/linked-text";
import { PageContainer } from "@/components/layout/page-container";
import { Alert } from "@/components/ui/alert";
import { ButtonLink } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { isSiteAdmin } from "@/db/queries/actor";
import { formatDateTime } from "@/lib/format-date";
import { isMailboxEnabled, listCapturedMail, type CapturedMail } from "@/lib/server/mailbox";
import { requireUser } from "@/lib/server/session";

export const metadata: Metadata = { title: "Development mailbox" };

export default async function MailboxPage() {
  const user = await requireUser("/admin/mailbox");
  if (!isSiteAdmin(user) || !isMailboxEnabled()) notFound();

  let messages: CapturedMail[] | null = null;
  try {
    messages = await listCapturedMail();
  } catch (error) {
    console.error("Reading the development mailbox failed:", error);
  }

  return (
    <PageContainer className="grid gap-6">
      <PageHeader
        eyebrow="Administration"
        title="Development mailbox"
        description="Mail captured by the local fake SMTP server. Nothing here left this machine."
        actions={
          <ButtonLink href="/admin/mailbox" variant="outline">
            Refresh
          </ButtonLink>
        }
      />
      {messages === null ? (
        <Alert variant="danger" title="The mailbox cannot be read">
          The fake mail server did not answer. It runs with <code className="font-mono">npm start</code> and{" "}
          <code className="font-mono">npm test</code>.
        </Alert>
      ) : messages.length === 0 ? (
        <EmptyState title="No mail yet" description="Sign-in links, password resets and invitations will appear here as they are sent." />
      ) : (
        <ol className="grid gap-4" aria-label="Captured messages, newest first">
          {messages.map((message) => (
            <li key={message.id}>
              <Card aria-label={message.subject}>
                <div className="flex flex-col gap-1 border-b border-border px-5 py-3 sm:flex-row sm:items-baseline sm:justify-between">
                  <h2 className="font-semibold">{message.subject}</h2>
                  <time dateTime={message.time.toISOString()} className="shrink-0 text-xs text-muted-foreground tabular">
                    {formatDateTime(message.time)}
                  </time>
                </div>
                <dl className="grid grid-cols-[4rem_1fr] gap-x-3 gap-y-1 px-5 pt-3 text-xs">
                  <dt className="text-muted-foreground">To</dt>
                  <dd className="font-mono">{message.to.map((to) => to.address).join(", ")}</dd>
                  <dt className="text-muted-foreground">From</dt>
                  <dd className="font-mono">{message.from.map((from) => from.address).join(", ")}</dd>
                </dl>
                <pre className="px-5 py-4 font-sans text-sm leading-relaxed whitespace-pre-wrap">
                  <LinkedText text={message.text ?? "(no plain-text body)"} />
                </pre>
              </Card>
            </li>
          ))}
        </ol>
      )}
    </PageContainer>
  );
}
