import { ConfigurationUnavailable } from "@/components/configurations/configuration-unavailable";

export default function ConfigurationForbidden() {
  return (
    <ConfigurationUnavailable
      title="You cannot open this configuration"
      description="It belongs to a group you are not a member of. Ask one of the group's owners for an invitation, or for a share link."
    />
  );
}
