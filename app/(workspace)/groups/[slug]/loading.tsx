import { PageContainer } from "@/components/layout/page-container";
import { Skeleton } from "@/components/ui/skeleton";

export default function GroupLoading() {
  return (
    <PageContainer className="grid gap-6" aria-busy="true" aria-label="Loading the group">
      <div className="grid gap-2 border-b border-border pb-5">
        <Skeleton className="h-3 w-24" />
        <Skeleton className="h-7 w-64" />
      </div>
      {[0, 1].map((card) => (
        <div key={card} className="grid gap-3 rounded-lg border border-border p-5">
          <Skeleton className="h-5 w-40" />
          {[0, 1, 2].map((row) => (
            <Skeleton key={row} className="h-8 w-full" />
          ))}
        </div>
      ))}
    </PageContainer>
  );
}
