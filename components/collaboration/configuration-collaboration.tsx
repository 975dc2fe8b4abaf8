import Link from "next/link";
import { AttachmentsPanel } from "@/components/collaboration/attachments-panel";
import { CommentsPanel } from "@/components/collaboration/comments-panel";
import { ShareLinksDialog } from "@/components/collaboration/share-links-dialog";
import { ExportMenu } from "@/components/configurations/export-menu";
import { buttonClassName } from "@/components/ui/button";

export interface ConfigurationToolbarProps {
  configurationId: string;
  canEdit: boolean;
  /** Export a specific revision instead of the current one. */
  revisionId?: string;
}

/** Export, share (editors) and history, for the header of a configuration's pages. */
export function ConfigurationCollaborationToolbar({ configurationId, canEdit, revisionId }: ConfigurationToolbarProps) {
  return (
    <div className="flex flex-wrap items-center gap-2">
      <ExportMenu configurationId={configurationId} revisionId={revisionId} />
      {canEdit ? <ShareLinksDialog configurationId={configurationId} /> : null}
      <Link href={`/configurations/${configurationId}/history`} className={buttonClassName({ variant: "outline" })}>
        History
      </Link>
    </div>
  );
}

export interface ConfigurationCollaborationProps {
  configurationId: string;
  canEdit: boolean;
  revisionId?: string;
  revisionNumber?: number;
}

/**
 * The collaboration block of a configuration's results page: share links (editors) and history,
 * then comments on the viewed revision and the attachments.
 */
export function ConfigurationCollaboration({ configurationId, canEdit, revisionId, revisionNumber }: ConfigurationCollaborationProps) {
  return (
    <section aria-label="Collaboration" className="grid gap-6 border-t border-border pt-6">
      <div className="flex flex-wrap items-center gap-2">
        {canEdit ? <ShareLinksDialog configurationId={configurationId} /> : null}
        <Link href={`/configurations/${configurationId}/history`} className={buttonClassName({ variant: "outline" })}>
          History and diff
        </Link>
      </div>
      <div className="grid gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <CommentsPanel configurationId={configurationId} revisionId={revisionId} revisionNumber={revisionNumber} />
        <AttachmentsPanel configurationId={configurationId} canEdit={canEdit} />
      </div>
    </section>
  );
}
