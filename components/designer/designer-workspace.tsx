"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import dynamic from "next/dynamic";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useCallback, useEffect, useState } from "react";
import type { MergeResult } from "@/lib/revisions/merge";
import { clearDraft, readDraft, writeDraft } from "@/lib/designer/draft-storage";
import { configurationQueries, useDeleteConfiguration, useForkConfiguration, useUpdateConfiguration, type ConfigurationJson } from "@/lib/client/configurations";
import { fetchStaleSave, type StaleSave } from "@/lib/client/stale-save";
import { announceSavedVersion, subscribeToSavedVersions } from "@/lib/client/version-channel";
import { ApiError } from "@/lib/client/api-client";
import { selectDocument, useDesignerStore } from "@/lib/client/designer-store";
import { limitText } from "@/lib/text-limit";
import { configurationTitleMaxLength } from "@/lib/validations/limits";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button, ButtonLink } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { ExportMenu } from "@/components/configurations/export-menu";
import { BoundaryGrid } from "./boundary-grid";
import { DesignerCanvas } from "./designer-canvas";
import { DocumentSettings } from "./document-settings";
import { DualityNotice } from "./duality-notice";
import type { WritableGroup } from "./fork-dialog";
import { ForkedFromNote } from "./forked-from-note";
import { SpectrumPreview } from "./spectrum-preview";
import { useLivePreview } from "./use-live-preview";
import { useOpenedOnce } from "@/lib/client/use-opened-once";

// Dialogs, the merge of a stale save and the PNG export load when first used: none of them is on
// screen when the designer opens, and their code is kept out of its first load.
const SaveDialog = dynamic(() => import("./save-dialog").then((module) => module.SaveDialog));
const ConflictDialog = dynamic(() => import("./conflict-dialog").then((module) => module.ConflictDialog));
const ForkDialog = dynamic(() => import("./fork-dialog").then((module) => module.ForkDialog));
const MoveWorldvolumeDialog = dynamic(() => import("./move-worldvolume-dialog").then((module) => module.MoveWorldvolumeDialog));

export interface DesignerWorkspaceProps {
  initial: ConfigurationJson;
  writableGroups: WritableGroup[];
}

type ForkMode = "saved" | "draft";

/**
 * The designer: canvas, boundary grid and live spectrum around one draft, with saving
 * (version-checked), conflict handling, forks and a local copy of unsaved work.
 */
export function DesignerWorkspace({ initial, writableGroups }: DesignerWorkspaceProps) {
  const id = initial.id;
  const router = useRouter();
  const queryClient = useQueryClient();
  // The stored version is polled (and read again on focus) so that a newer save by someone else is
  // noticed while editing; other tabs of this browser also announce their saves at once.
  const { data: configuration } = useQuery({
    ...configurationQueries.detail(id),
    initialData: initial,
    refetchInterval: 30_000,
    refetchOnWindowFocus: true,
  });
  const ready = useDesignerStore((s) => s.configurationId === id);
  const document = useDesignerStore(selectDocument);
  const dirty = useDesignerStore((s) => s.dirty);
  const baseVersion = useDesignerStore((s) => s.baseVersion);
  const notice = useDesignerStore((s) => s.notice);
  const { load, markSaved, rebase, setTitle, dismissNotice } = useDesignerStore.getState();

  const [recoveredAt, setRecoveredAt] = useState<number | null>(null);
  const [saveOpen, setSaveOpen] = useState(false);
  const [saveError, setSaveError] = useState<string | null>(null);
  const [conflictOpen, setConflictOpen] = useState(false);
  const [stale, setStale] = useState<StaleSave | null>(null);
  const [staleError, setStaleError] = useState<string | null>(null);
  const [merge, setMerge] = useState<MergeResult | null>(null);
  const [mergedFrom, setMergedFrom] = useState<number | null>(null);
  const [titleNote, setTitleNote] = useState<string | null>(null);
  const [moveStackId, setMoveStackId] = useState<string | null>(null);
  const saveOpened = useOpenedOnce(saveOpen);
  const conflictOpened = useOpenedOnce(conflictOpen);
  const moveOpened = useOpenedOnce(moveStackId !== null);
  const [forkMode, setForkMode] = useState<ForkMode | null>(null);
  const [forkError, setForkError] = useState<string | null>(null);
  const [forkPending, setForkPending] = useState(false);
  const [storageWarning, setStorageWarning] = useState(false);
  const [exportError, setExportError] = useState<string | null>(null);
  const [exportingPng, setExportingPng] = useState(false);

  const update = useUpdateConfiguration(id);
  const fork = useForkConfiguration(id);
  const remove = useDeleteConfiguration(id);
  const [deleteOpen, setDeleteOpen] = useState(false);
  const canEdit = configuration.canEdit;

  // Load the saved document, or an unsaved draft of it kept in this browser. Runs again if the
  // store holds another document (another designer tab state, or a store re-created by a reload).
  useEffect(() => {
    if (ready) return;
    const draft = readDraft(window.localStorage, id);
    if (draft && JSON.stringify(draft.document) !== JSON.stringify(configuration.document)) {
      load(draft.document, { configurationId: id, baseVersion: draft.baseVersion ?? configuration.version, dirty: true });
      setRecoveredAt(draft.savedAt);
    } else {
      if (draft) clearDraft(window.localStorage, id);
      load(configuration.document, { configurationId: id, baseVersion: configuration.version });
    }
  }, [id, ready, configuration, load]);

  // Keep every unsaved change in localStorage until it is saved.
  useEffect(() => {
    if (!ready || !dirty || !canEdit) return;
    const ok = writeDraft(window.localStorage, id, { document, baseVersion, savedAt: Date.now() });
    setStorageWarning(!ok);
  }, [ready, dirty, document, baseVersion, id, canEdit]);

  useEffect(() => {
    if (!dirty) return;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty]);

  // Another tab saved this configuration: read the stored version now rather than at the next poll.
  useEffect(
    () =>
      subscribeToSavedVersions((message) => {
        if (message.configurationId === id) void queryClient.invalidateQueries({ queryKey: configurationQueries.detail(id).queryKey });
      }),
    [id, queryClient],
  );

  const newerStored = ready && baseVersion !== null && configuration.version > baseVersion;

  const preview = useLivePreview(document, dirty);
  const blocked = preview.issues.length > 0;

  const openSave = useCallback(() => {
    if (!canEdit) return;
    setSaveError(null);
    setSaveOpen(true);
  }, [canEdit]);

  function save(message: string) {
    const state = useDesignerStore.getState();
    const sent = state.history.present;
    if (state.baseVersion === null) return;
    update.mutate(
      { document: sent, message, expectedVersion: state.baseVersion },
      {
        onSuccess: (updated) => {
          markSaved(updated.version, sent);
          announceSavedVersion(id, updated.version);
          setMergedFrom(null);
          if (!useDesignerStore.getState().dirty) clearDraft(window.localStorage, id);
          setRecoveredAt(null);
          setSaveOpen(false);
        },
        onError: (error) => {
          if (error instanceof ApiError && error.status === 409) {
            setSaveOpen(false);
            void openConflict();
          } else {
            const detail = error instanceof ApiError && error.issues.length > 0 ? ` ${error.issues.map((i) => i.message).join(" ")}` : "";
            setSaveError(`${error.message}${detail} Your draft is kept in this browser.`);
          }
        },
      },
    );
  }

  /** Reads who saved what since the draft's version and tries a merge, for the conflict dialog. */
  async function openConflict() {
    const base = useDesignerStore.getState().baseVersion;
    setConflictOpen(true);
    setStale(null);
    setMerge(null);
    setStaleError(null);
    if (base === null) return;
    try {
      const [read, { mergeConfigurations }] = await Promise.all([fetchStaleSave(queryClient, id, base), import("@/lib/revisions/merge")]);
      setStale(read);
      setMerge(read.base ? mergeConfigurations(read.base, useDesignerStore.getState().history.present, read.latest.document) : null);
    } catch (error) {
      setStaleError(error instanceof Error ? `The stored version could not be read: ${error.message}` : "The stored version could not be read.");
    }
  }

  function applyMerge() {
    if (!stale || !merge?.document) return;
    rebase(merge.document, stale.latest.version);
    setMergedFrom(stale.latest.version);
    setConflictOpen(false);
  }

  async function reloadLatest() {
    const fresh = await queryClient.fetchQuery({ ...configurationQueries.detail(id), staleTime: 0 });
    clearDraft(window.localStorage, id);
    load(fresh.document, { configurationId: id, baseVersion: fresh.version });
    setConflictOpen(false);
    setRecoveredAt(null);
    setMergedFrom(null);
  }

  function discardDraft() {
    clearDraft(window.localStorage, id);
    load(configuration.document, { configurationId: id, baseVersion: configuration.version });
    setRecoveredAt(null);
  }

  async function doFork(input: { targetGroupId: string; title: string }) {
    setForkError(null);
    setForkPending(true);
    try {
      const state = useDesignerStore.getState();
      const current = configuration.currentRevision;
      // A draft forks from the revision it was based on, when that is the one loaded here.
      const revisionId = forkMode === "draft" && current?.number !== state.baseVersion ? undefined : current?.id;
      // A draft travels with the fork request, so the fork starts from it in one step.
      const document = forkMode === "draft" ? state.history.present : undefined;
      const created = await fork.mutateAsync({ targetGroupId: input.targetGroupId, title: input.title, revisionId, document });
      if (document) clearDraft(window.localStorage, id);
      setForkMode(null);
      setConflictOpen(false);
      router.push(`/configurations/${created.id}`);
    } catch (error) {
      setForkError(error instanceof Error ? error.message : "The fork failed. Your draft is kept in this browser.");
    } finally {
      setForkPending(false);
    }
  }

  if (!ready) {
    return <p className="p-6 text-sm text-muted-foreground">Opening the designer&hellip;</p>;
  }

  return (
    <div className="flex flex-col gap-3 px-4 py-3">
      <header className="flex flex-wrap items-center gap-x-3 gap-y-2">
        <div className="flex min-w-0 flex-1 flex-col">
          <div className="flex items-center gap-2 text-xs text-muted-foreground">
            <span>{configuration.group.kind === "personal" ? "Personal space" : configuration.group.name}</span>
            <span aria-hidden="true">/</span>
            <Badge variant="outline">{document.theory}</Badge>
            <span data-testid="saved-version">version {baseVersion ?? configuration.version}</span>
            <ForkedFromNote forkedFrom={configuration.forkedFrom} />
          </div>
          <label className="sr-only" htmlFor="configuration-title">
            Title
          </label>
          <input
            id="configuration-title"
            value={document.title}
            readOnly={!canEdit}
            aria-describedby={titleNote ? "configuration-title-note" : undefined}
            onChange={(event) => {
              const limited = limitText(event.target.value, configurationTitleMaxLength, "Titles");
              setTitleNote(limited.note);
              setTitle(limited.text);
            }}
            onBlur={() => setTitleNote(null)}
            className="-ml-1 w-full min-w-0 truncate rounded px-1 text-xl font-semibold tracking-tight hover:bg-surface-muted focus:bg-surface focus-visible:outline-2 focus-visible:outline-ring"
          />
          {titleNote ? (
            <p id="configuration-title-note" role="alert" className="text-xs text-danger-soft-foreground">
              {titleNote}
            </p>
          ) : null}
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <span role="status" aria-live="polite" className="text-xs text-muted-foreground" data-testid="save-state">
            {dirty ? "Unsaved changes" : "All changes saved"}
          </span>
          <ButtonLink href={`/configurations/${id}/results`} variant="secondary" size="sm">
            Results
          </ButtonLink>
          <ButtonLink href={`/configurations/${id}/sweeps`} variant="ghost" size="sm">
            Sweeps
          </ButtonLink>
          <ButtonLink href={`/configurations/${id}/history`} variant="ghost" size="sm">
            History
          </ButtonLink>
          {configuration.forkedFrom?.title ? (
            <ButtonLink href={`/configurations/${id}/compare?with=${configuration.forkedFrom.configurationId}`} variant="ghost" size="sm">
              Compare with source
            </ButtonLink>
          ) : null}
          <ExportMenu
            configurationId={id}
            onExportPng={() => {
              setExportError(null);
              setExportingPng(true);
              const findFrame = () => window.document.querySelector<HTMLElement>("[data-designer-canvas]");
              const state = useDesignerStore.getState();
              void Promise.all([import("@/components/canvas/export-canvas-png"), import("@/lib/designer/png-legend")])
                .then(([png, { pngLegend }]) =>
                  png.exportCanvasPngWhenReady(findFrame, png.pngFileName(document.title), pngLegend(document, state.displayAxes, state.viewport?.scale ?? 0)),
                )
                .then((done) => {
                  if (!done) setExportError("The canvas has not finished drawing, so there was nothing to export. Try again in a moment.");
                })
                .catch(() => setExportError("The PNG export could not be loaded. Check the connection and try again."))
                .finally(() => setExportingPng(false));
            }}
          />
          <Button variant="secondary" size="sm" onClick={() => setForkMode("saved")} disabled={writableGroups.length === 0}>
            Fork
          </Button>
          {canEdit ? (
            <Button variant="ghost" size="sm" onClick={() => setDeleteOpen(true)}>
              Delete
            </Button>
          ) : null}
          {canEdit ? (
            <Button size="sm" onClick={openSave} disabled={!dirty || blocked} title={blocked ? "Fix the problems shown in the grid first" : undefined}>
              Save
            </Button>
          ) : null}
        </div>
      </header>

      {!canEdit ? (
        <Alert variant="info">You can view this configuration but not change it. Fork it into your own space to edit.</Alert>
      ) : null}
      {recoveredAt !== null ? (
        <Alert variant="warning" title="Unsaved draft restored">
          Your changes from {new Date(recoveredAt).toLocaleString()} were kept in this browser and are shown here.{" "}
          <button type="button" onClick={discardDraft} className="font-medium underline">
            Discard the draft
          </button>
        </Alert>
      ) : null}
      {storageWarning ? (
        <Alert variant="warning">This browser refused to keep a local copy of your draft; save soon to avoid losing work.</Alert>
      ) : null}
      {exportError ? <Alert variant="danger">{exportError}</Alert> : null}
      {notice ? (
        <Alert variant="warning" title="Not done">
          {notice}{" "}
          <button type="button" onClick={dismissNotice} className="font-medium underline">
            Dismiss
          </button>
        </Alert>
      ) : null}
      <DualityNotice onFork={writableGroups.length > 0 ? () => setForkMode("draft") : undefined} />
      {newerStored && !conflictOpen ? (
        <div role="status" className="rounded-md border border-warning/40 bg-warning-soft px-3 py-2 text-sm text-warning-soft-foreground" data-testid="newer-version">
          <p>
            <span className="font-semibold">Version {configuration.version} was saved</span> elsewhere (another tab, or a collaborator) while you had version{" "}
            {baseVersion} open.
          </p>
          <p className="mt-1 flex flex-wrap gap-3">
            <button type="button" className="font-medium underline" onClick={() => void openConflict()}>
              See what changed{dirty ? " and merge" : ""}
            </button>
            <button type="button" className="font-medium underline" onClick={() => void reloadLatest()}>
              Load version {configuration.version}
              {dirty ? " (discard my draft)" : ""}
            </button>
          </p>
        </div>
      ) : null}
      {mergedFrom !== null && dirty ? (
        <Alert variant="info" title="Merged">
          Your changes now sit on top of version {mergedFrom}. Check them, then save.
        </Alert>
      ) : null}

      {/* One column on a phone; on a wide screen the preview beside the canvas and the grid across both, wide enough for every column. */}
      <div className="grid min-w-0 gap-3 xl:grid-cols-[minmax(0,1fr)_28rem]">
        <DesignerCanvas
          result={preview.result}
          readOnly={!canEdit}
          lightPalette={exportingPng}
          onSaveShortcut={openSave}
          onMoveWorldvolume={canEdit ? setMoveStackId : undefined}
          className="h-[min(56vh,560px)] min-w-0 xl:h-auto xl:min-h-[min(56vh,560px)]"
        />
        <div className="order-last min-w-0 rounded-lg border border-border bg-surface p-3 xl:order-none xl:max-h-[calc(100vh-6rem)] xl:overflow-y-auto">
          <SpectrumPreview result={preview.result} issues={preview.issues} elapsedMs={preview.elapsedMs} stringScaleGeV={document.stringScaleGeV} stacks={document.stacks} />
        </div>
        <div className="flex min-w-0 flex-col gap-3 xl:col-span-2">
          <DocumentSettings readOnly={!canEdit} />
          <BoundaryGrid issuesByStack={preview.byStack} readOnly={!canEdit} onMoveWorldvolume={canEdit ? setMoveStackId : undefined} />
          {preview.document.length > 0 ? (
            <Alert variant="danger" title="Problems with the configuration">
              <ul className="list-disc pl-4">
                {preview.document.map((issue) => (
                  <li key={`${issue.path.join(".")}-${issue.message}`}>{issue.message}</li>
                ))}
              </ul>
            </Alert>
          ) : null}
        </div>
      </div>
      {moveOpened ? <MoveWorldvolumeDialog stackId={moveStackId} onClose={() => setMoveStackId(null)} /> : null}

      <Dialog
        open={deleteOpen}
        onOpenChange={setDeleteOpen}
        title="Delete this configuration?"
        description="It disappears from lists and links for everyone in the space. Nothing is erased: the record and its revisions are kept in the database."
        footer={
          <>
            <Button variant="secondary" onClick={() => setDeleteOpen(false)}>
              Cancel
            </Button>
            <Button
              variant="danger"
              pending={remove.isPending}
              onClick={() =>
                remove.mutate(undefined, {
                  onSuccess: () => {
                    clearDraft(window.localStorage, id);
                    router.push(`/dashboard?${new URLSearchParams({ deleted: id, title: configuration.title }).toString()}`);
                  },
                })
              }
            >
              Delete
            </Button>
          </>
        }
      >
        {remove.error ? <p className="text-danger-soft-foreground">{remove.error.message}</p> : null}
      </Dialog>
      {saveOpened ? <SaveDialog open={saveOpen} onOpenChange={setSaveOpen} pending={update.isPending} error={saveError} onSave={save} /> : null}
      {conflictOpened ? (
        <ConflictDialog
          open={conflictOpen}
          onOpenChange={setConflictOpen}
          baseVersion={baseVersion}
          stale={stale}
          error={staleError}
          merge={merge}
          canFork={writableGroups.length > 0}
          pending={forkPending}
          onMerge={applyMerge}
          onReload={() => void reloadLatest()}
          onFork={() => {
            setConflictOpen(false);
            setForkMode("draft");
          }}
        />
      ) : null}
      {forkMode !== null ? (
        <ForkDialog
          open
          onOpenChange={(open) => {
            if (!open) setForkMode(null);
          }}
          groups={writableGroups}
          defaultTitle={forkMode === "draft" ? `${document.title} (my version)` : `${configuration.title} (fork)`}
          sourceLabel={forkMode === "draft" ? `version ${baseVersion ?? "?"} with your unsaved changes` : `version ${configuration.version}`}
          pending={forkPending}
          error={forkError}
          onFork={(input) => void doFork(input)}
        />
      ) : null}
      <p className="text-xs text-muted-foreground">
        Need the full tables? <Link href={`/configurations/${id}/results`} className="text-accent underline-offset-2 hover:underline">Open the results panel</Link> for the saved revision.
      </p>
    </div>
  );
}
