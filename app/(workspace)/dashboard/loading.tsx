import { MyConfigurationsPanelSkeleton } from "@/components/dashboard/my-configurations-panel";
import { MyGroupsPanelSkeleton } from "@/components/dashboard/my-groups-panel";
import { RecentActivityPanelSkeleton } from "@/components/dashboard/recent-activity-panel";
import { PageContainer } from "@/components/layout/page-container";
import { Skeleton } from "@/components/ui/skeleton";

export default function DashboardLoading() {
  return (
    <PageContainer className="grid gap-6" aria-busy="true">
      <div className="grid gap-2 border-b border-border pb-5">
        <Skeleton className="h-7 w-72" />
        <Skeleton className="h-4 w-96 max-w-full" />
      </div>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,24rem)]">
        <MyConfigurationsPanelSkeleton />
        <div className="grid content-start gap-6">
          <MyGroupsPanelSkeleton />
          <RecentActivityPanelSkeleton />
        </div>
      </div>
    </PageContainer>
  );
}
