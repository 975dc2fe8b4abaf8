import { Skeleton } from "@/components/ui/skeleton";

export default function ConfigurationDesignerLoading() {
  return (
    <div className="flex flex-col gap-3 px-4 py-3" aria-busy="true" aria-label="Loading the designer">
      <Skeleton className="h-4 w-48" />
      <Skeleton className="h-8 w-96" />
      <div className="grid gap-3 xl:grid-cols-[minmax(0,1fr)_25rem]">
        <div className="flex flex-col gap-3">
          <Skeleton className="h-[min(56vh,560px)] w-full" />
          <Skeleton className="h-32 w-full" />
        </div>
        <Skeleton className="h-96 w-full" />
      </div>
    </div>
  );
}
