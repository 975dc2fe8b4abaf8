import type { Metadata } from "next";
import { Suspense } from "react";
import { ConfigurationsPanel } from "@/components/configurations/configurations-panel";
import { DeletedNotice } from "@/components/dashboard/deleted-notice";
import { MyConfigurationsPanelSkeleton } from "@/components/dashboard/my-configurations-panel";
import { MyGroupsPanel, MyGroupsPanelSkeleton } from "@/components/dashboard/my-groups-panel";
import { RecentActivityPanel, RecentActivityPanelSkeleton } from "@/components/dashboard/recent-activity-panel";
import { listRecentActivityForUser } from "@/db/queries/auth";
import { PageContainer } from "@/components/layout/page-container";
import { PageHeader } from "@/components/ui/page-header";
import { requireUser } from "@/lib/server/session";
import { deletedNoticeSchema } from "@/lib/validations/configuration-api";

export const metadata: Metadata = { title: "Dashboard" };

export default async function DashboardPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireUser("/dashboard");
  // After a delete the designer comes here with ?deleted=<id>&title=<title> to offer an undo.
  const deleted = deletedNoticeSchema.safeParse(await searchParams);
  // Someone who has not saved, forked, commented or joined anything yet is new here, not back.
  const returning = (await listRecentActivityForUser(user, { limit: 1 })).length > 0;
  const firstName = user.name.split(" ")[0] ?? user.name;

  return (
    <PageContainer className="grid gap-6">
      <PageHeader
        title={returning ? `Welcome back, ${firstName}` : `Welcome to Mooring, ${firstName}`}
        description={
          returning
            ? "Your configurations, groups and recent activity."
            : "Start with a new configuration, or open one your groups share. What you save, fork and comment on is listed here."
        }
      />
      {deleted.success ? <DeletedNotice configurationId={deleted.data.deleted} title={deleted.data.title} /> : null}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,24rem)]">
        <div className="grid content-start gap-6">
          <Suspense fallback={<MyConfigurationsPanelSkeleton />}>
            <ConfigurationsPanel actor={user} />
          </Suspense>
        </div>
        <div className="grid content-start gap-6">
          <Suspense fallback={<MyGroupsPanelSkeleton />}>
            <MyGroupsPanel actor={user} />
          </Suspense>
          <Suspense fallback={<RecentActivityPanelSkeleton />}>
            <RecentActivityPanel actor={user} />
          </Suspense>
        </div>
      </div>
    </PageContainer>
  );
}
