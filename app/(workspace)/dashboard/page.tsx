import type { Metadata } from "next";
import { Suspense } from "react";
import { ConfigurationsPanel } from "@/components/configurations/configurations-panel";
import { MyConfigurationsPanelSkeleton } from "@/components/dashboard/my-configurations-panel";
import { MyGroupsPanel, MyGroupsPanelSkeleton } from "@/components/dashboard/my-groups-panel";
import { RecentActivityPanel, RecentActivityPanelSkeleton } from "@/components/dashboard/recent-activity-panel";
import { PageContainer } from "@/components/layout/page-container";
import { PageHeader } from "@/components/ui/page-header";
import { requireUser } from "@/lib/session";

export const metadata: Metadata = { title: "Dashboard" };

export default async function DashboardPage() {
  const user = await requireUser("/dashboard");

  return (
    <PageContainer className="grid gap-6">
      <PageHeader title={`Welcome back, ${user.name.split(" ")[0] ?? user.name}`} description="Your configurations, groups and recent activity." />
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
