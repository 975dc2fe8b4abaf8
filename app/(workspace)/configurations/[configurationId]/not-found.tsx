import { EmptyState } from "@/components/ui/empty-state";
import { ButtonLink } from "@/components/ui/button";

export default function ConfigurationNotFound() {
  return (
    <div className="mx-auto max-w-xl px-4 py-12">
      <EmptyState
        title="No such configuration"
        description="It does not exist, was deleted, or belongs to a group you are not a member of."
        action={<ButtonLink href="/dashboard">Back to the dashboard</ButtonLink>}
      />
    </div>
  );
}
