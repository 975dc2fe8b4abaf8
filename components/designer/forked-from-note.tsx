import Link from "next/link";

export interface ForkedFromNoteProps {
  forkedFrom: { configurationId: string; revisionNumber: number | null; title: string | null } | null;
}

/** "forked from <title> (revision n)" with a link, or nothing for an original configuration. */
export function ForkedFromNote({ forkedFrom }: ForkedFromNoteProps) {
  if (!forkedFrom) return null;
  const revision = forkedFrom.revisionNumber !== null ? ` (revision ${forkedFrom.revisionNumber})` : "";
  return (
    <span className="text-xs text-muted-foreground" data-testid="forked-from">
      forked from{" "}
      {forkedFrom.title !== null ? (
        <Link href={`/configurations/${forkedFrom.configurationId}`} className="font-medium text-accent underline-offset-2 hover:underline">
          {forkedFrom.title}
          {revision}
        </Link>
      ) : (
        <span>a configuration you cannot open{revision}</span>
      )}
    </span>
  );
}
