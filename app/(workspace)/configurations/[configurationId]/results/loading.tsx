import { Skeleton } from "@/components/ui/skeleton";

export default function ConfigurationResultsLoading() {
  return (
    <div className="mx-auto grid w-full max-w-7xl gap-6 px-4 py-6 sm:px-6" aria-busy="true" aria-label="Loading the results">
      <Skeleton className="h-10 w-2/3" />
      <div className="grid gap-4 md:grid-cols-3">
        <Skeleton className="h-28" />
        <Skeleton className="h-28" />
        <Skeleton className="h-28" />
      </div>
      <Skeleton className="h-48" />
      <Skeleton className="h-72" />
    </div>
  );
}
