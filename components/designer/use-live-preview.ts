"use client";

import { useMemo } from "react";
import type { Configuration } from "@/lib/boundary/types";
import { computeLivePreview, groupIssues, type LivePreview } from "@/lib/designer/live-preview";

/** The live check and spectrum of a draft, recomputed only when the document changes. */
export function useLivePreview(document: Configuration): LivePreview & ReturnType<typeof groupIssues> {
  return useMemo(() => {
    const preview = computeLivePreview(document);
    return { ...preview, ...groupIssues(preview.issues) };
  }, [document]);
}
