import { ConfigurationUnavailable } from "@/components/configurations/configuration-unavailable";

export default function ConfigurationNotFound() {
  return (
    <ConfigurationUnavailable
      title="No such configuration"
      description="It does not exist, or it was deleted. Check the link, or look in your dashboard and your groups."
    />
  );
}
