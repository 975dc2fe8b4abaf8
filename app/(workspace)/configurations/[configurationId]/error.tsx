"use client";

import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

export default function ConfigurationDesignerError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="mx-auto grid max-w-xl gap-4 px-4 py-12">
      <Alert variant="danger" title="The designer could not open this configuration">
        {error.message || "Something went wrong."} Unsaved changes are kept in this browser and come back when the designer opens again.
      </Alert>
      <div>
        <Button onClick={reset}>Try again</Button>
      </div>
    </div>
  );
}
