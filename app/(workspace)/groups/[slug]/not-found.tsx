import Link from "next/link";
import { PageContainer } from "@/components/layout/page-container";
import { buttonClassName } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";

export default function GroupNotFound() {
  return (
    <PageContainer>
      <EmptyState
        title="Group not found"
        description="It does not exist, or you are not a member. Ask an owner for an invitation."
        action={
          <Link href="/dashboard" className={buttonClassName({ variant: "secondary" })}>
            Back to the dashboard
          </Link>
        }
      />
    </PageContainer>
  );
}
