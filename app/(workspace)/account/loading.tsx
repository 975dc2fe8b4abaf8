import { PageContainer } from "@/components/layout/page-container";
import { Skeleton } from "@/components/ui/skeleton";

export default function AccountLoading() {
  return (
    <PageContainer aria-busy="true">
      <div className="grid max-w-3xl gap-6">
        <div className="grid gap-2 border-b border-border pb-5">
          <Skeleton className="h-7 w-40" />
          <Skeleton className="h-4 w-80 max-w-full" />
        </div>
        {[0, 1, 2, 3].map((card) => (
          <Skeleton key={card} className="h-44 w-full rounded-lg" />
        ))}
      </div>
    </PageContainer>
  );
}
