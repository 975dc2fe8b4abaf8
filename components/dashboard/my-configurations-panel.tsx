import { Card, CardContent, CardHeader } from "@/components/ui/card";
import { Skeleton } from "@/components/ui/skeleton";

/** Placeholder for the dashboard's configurations panel while it loads. */
export function MyConfigurationsPanelSkeleton() {
  return (
    <Card aria-busy="true" aria-label="Loading your configurations">
      <CardHeader>
        <Skeleton className="h-5 w-40" />
        <Skeleton className="h-4 w-72" />
      </CardHeader>
      <CardContent className="grid gap-3">
        {[0, 1, 2, 3].map((row) => (
          <div key={row} className="flex items-center gap-3">
            <div className="grid flex-1 gap-1.5">
              <Skeleton className="h-4 w-52" />
              <Skeleton className="h-3 w-64" />
            </div>
            <Skeleton className="h-5 w-24 rounded-full" />
          </div>
        ))}
      </CardContent>
    </Card>
  );
}
