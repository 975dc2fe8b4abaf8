import Link from "next/link";
import { Alert } from "@/components/ui/alert";

/** Shown for a link whose token cannot even be parsed (cut off or mistyped). */
export function InvalidLinkAlert({ requestHref }: { requestHref: string }) {
  return (
    <Alert variant="danger" title="This link is not valid">
      Check that the whole address was copied, or{" "}
      <Link href={requestHref} className="font-medium underline">
        request a new link
      </Link>
      .
    </Alert>
  );
}
