import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { GroupConfigurationsTable } from "@/components/collaboration/group-configurations-table";
import { ConfigurationTable } from "@/components/configurations/configuration-table";
import { InvitationsPanel } from "@/components/collaboration/invitations-panel";
import { MembersTable } from "@/components/collaboration/members-table";
import { StarterForksComparison } from "@/components/collaboration/starter-forks-comparison";
import { PageContainer } from "@/components/layout/page-container";
import { buttonClassName } from "@/components/ui/button";
import { Card, CardContent, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { roleAtLeast } from "@/db/queries/actor";
import { listConfigurationsForGroup } from "@/db/queries/configurations";
import { getGroupBySlug, listMembers } from "@/db/queries/groups";
import { listInvitations } from "@/db/queries/invitations";
import { listStarterForks } from "@/db/queries/labs";
import { listLabSweeps } from "@/db/queries/sweeps";
import { NotFoundError } from "@/lib/errors";
import { requireUser } from "@/lib/server/session";
import { toJson } from "@/lib/client/api-client";

interface GroupPageProps {
  params: Promise<{ slug: string }>;
}

const kindLabels = { personal: "Personal space", research: "Research group", lab: "Lab" } as const;

export async function generateMetadata({ params }: GroupPageProps): Promise<Metadata> {
  const { slug } = await params;
  return { title: `Group ${slug}` };
}

export default async function GroupPage({ params }: GroupPageProps) {
  const { slug } = await params;
  const actor = await requireUser(`/groups/${slug}`);
  const group = await getGroupBySlug(actor, slug).catch((error: unknown) => {
    if (error instanceof NotFoundError) notFound();
    throw error;
  });
  const isOwner = group.role === "owner";
  const isLab = group.kind === "lab";
  const personal = group.kind === "personal";
  const pageSize = 10;
  const [members, firstPage, labConfigurations, invitations, comparison, labSweeps] = await Promise.all([
    listMembers(actor, group.id),
    listConfigurationsForGroup(actor, group.id, { sort: "updated", direction: "desc", limit: pageSize }),
    isLab ? listConfigurationsForGroup(actor, group.id, { sort: "title", direction: "asc", limit: 500, starter: isOwner ? undefined : true }) : null,
    isOwner && !personal ? listInvitations(actor, group.id) : Promise.resolve([]),
    isLab && roleAtLeast(group.role, "editor") ? listStarterForks(actor, group.id) : Promise.resolve(null),
    isLab && roleAtLeast(group.role, "editor") ? listLabSweeps(actor, group.id) : Promise.resolve({}),
  ]);

  return (
    <PageContainer className="grid gap-6">
      <PageHeader
        eyebrow={kindLabels[group.kind]}
        title={personal ? "My space" : group.name}
        description={group.description || undefined}
        actions={
          <>
            {isOwner && !personal ? (
              <Link href={`/groups/${group.slug}/audit`} className={buttonClassName({ variant: "outline" })}>
                Audit log
              </Link>
            ) : null}
            {roleAtLeast(group.role, "editor") ? (
              <Link href={`/configurations/import?group=${group.id}`} className={buttonClassName({ variant: "secondary" })}>
                Import a file
              </Link>
            ) : null}
          </>
        }
      />

      <Card aria-labelledby="configurations-title">
        <CardHeader>
          <CardTitle id="configurations-title">Configurations</CardTitle>
          <CardDescription>
            {firstPage.total === 1 ? "1 configuration" : `${firstPage.total} configurations`} in this {personal ? "space" : isLab ? "lab" : "group"}. Open one to see its results, comments, history and forks.
          </CardDescription>
        </CardHeader>
        <CardContent>
          <ConfigurationTable
            groupId={group.id}
            label="Group configurations"
            pageSize={pageSize}
            initialData={{ ...toJson(firstPage), page: 1, pageSize }}
            emptyMessage={roleAtLeast(group.role, "editor") ? "No configurations yet. Create one in the designer or import a configuration file." : "No configurations yet."}
          />
        </CardContent>
      </Card>

      {labConfigurations ? (
        <Card aria-labelledby="starters-title">
          <CardHeader>
            <CardTitle id="starters-title">Starter configurations</CardTitle>
            <CardDescription>
              {isOwner
                ? "Publish configurations as starters; students fork them into their own space and their forks appear under “Student forks”."
                : "Fork a starter into your own space to explore other boundary choices; the instructor sees your fork’s key results."}
            </CardDescription>
          </CardHeader>
          <CardContent>
            <GroupConfigurationsTable
              configurations={labConfigurations.items}
              groupSlug={group.slug}
              canPublishStarters={isOwner}
              forkScope="starters"
              emptyTitle={isOwner ? "No configurations in this lab yet" : "No starters yet"}
              emptyDescription={isOwner ? "Create a configuration in this lab, then publish it here." : "Your instructor has not published a starter configuration yet."}
              caption={isOwner ? "Every configuration of the lab." : "Starters published by the lab's instructors."}
            />
          </CardContent>
        </Card>
      ) : null}

      {comparison ? (
        <Card aria-labelledby="forks-title">
          <CardHeader>
            <CardTitle id="forks-title">Student forks</CardTitle>
            <CardDescription>Every student&apos;s fork of each starter, with its key results and the student&apos;s sweeps side by side.</CardDescription>
          </CardHeader>
          <CardContent>
            <StarterForksComparison comparison={comparison} sweeps={labSweeps} />
          </CardContent>
        </Card>
      ) : null}

      <Card aria-labelledby="members-title">
        <CardHeader>
          <CardTitle id="members-title">Members</CardTitle>
          <CardDescription>
            Owners manage members and invitations; editors change configurations; viewers read and comment.
          </CardDescription>
        </CardHeader>
        <CardContent>
          <MembersTable
            groupId={group.id}
            groupName={group.name}
            myUserId={actor.id}
            myRole={group.role}
            personal={personal}
            initialMembers={toJson(members)}
          />
        </CardContent>
      </Card>

      {isOwner && !personal ? (
        <Card aria-labelledby="invitations-title">
          <CardHeader>
            <CardTitle id="invitations-title">Invitations</CardTitle>
            <CardDescription>Invite people by e-mail. The link works for 7 days, once; new people create their account on the way.</CardDescription>
          </CardHeader>
          <CardContent>
            <InvitationsPanel groupId={group.id} initialInvitations={toJson(invitations)} />
          </CardContent>
        </Card>
      ) : null}
    </PageContainer>
  );
}
