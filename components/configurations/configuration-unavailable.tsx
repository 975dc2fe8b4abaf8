import { ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";

export interface ConfigurationUnavailableProps {
  title: string;
  description: string;
}

/** The page shown in place of a configuration that is missing (404) or not shared with the reader (403). */
export function ConfigurationUnavailable({ title, description }: ConfigurationUnavailableProps) {
  return (
    <div className="mx-auto max-w-xl px-4 py-12">
      <EmptyState title={title} description={description} action={<ButtonLink href="/dashboard">Back to the dashboard</ButtonLink>} />
    </div>
  );
}
