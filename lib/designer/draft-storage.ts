/**
 * Keeps unsaved drafts in Web Storage so nothing typed is lost on a failed save or a reload.
 * The storage is passed in, so the module runs (and is tested) without a browser.
 */
import type { Configuration } from "@/lib/boundary/types";

/** What is kept per configuration until it is saved. */
export interface StoredDraft {
  document: Configuration;
  /** The version the draft was based on, or null for a configuration not yet created. */
  baseVersion: number | null;
  /** Milliseconds since the epoch when the draft was written. */
  savedAt: number;
}

/** The subset of `Storage` used here. */
export type DraftStorage = Pick<Storage, "getItem" | "setItem" | "removeItem">;

const prefix = "mooring:draft:";

/** The storage key of a configuration's draft. */
export function draftKey(configurationId: string): string {
  return `${prefix}${configurationId}`;
}

/** Writes a draft; storage errors (quota, private mode) are swallowed and reported as false. */
export function writeDraft(storage: DraftStorage, configurationId: string, draft: StoredDraft): boolean {
  try {
    storage.setItem(draftKey(configurationId), JSON.stringify(draft));
    return true;
  } catch {
    return false;
  }
}

/** Reads a draft, or null when there is none or it cannot be parsed. */
export function readDraft(storage: DraftStorage, configurationId: string): StoredDraft | null {
  let raw: string | null;
  try {
    raw = storage.getItem(draftKey(configurationId));
  } catch {
    return null;
  }
  if (raw === null) return null;
  try {
    const parsed: unknown = JSON.parse(raw);
    if (!isStoredDraft(parsed)) return null;
    return parsed;
  } catch {
    return null;
  }
}

/** Forgets a draft once it is saved or discarded. */
export function clearDraft(storage: DraftStorage, configurationId: string): void {
  try {
    storage.removeItem(draftKey(configurationId));
  } catch {
    // Storage unavailable: there is nothing to clear.
  }
}

function isStoredDraft(value: unknown): value is StoredDraft {
  if (typeof value !== "object" || value === null) return false;
  const v = value as Record<string, unknown>;
  const doc = v.document as Record<string, unknown> | undefined;
  return (
    typeof v.savedAt === "number" &&
    (v.baseVersion === null || typeof v.baseVersion === "number") &&
    typeof doc === "object" &&
    doc !== null &&
    (doc.format === 1 || doc.format === 2) &&
    Array.isArray(doc.stacks)
  );
}
