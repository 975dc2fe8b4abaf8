"use client";

import { useEffect, useMemo, useState } from "react";
import type { Configuration } from "@/lib/boundary/types";
import type { FieldIssue } from "@/lib/errors";
import { computeLivePreview, groupIssues, type LivePreview } from "@/lib/designer/live-preview";

type ShapeCheck = (document: Configuration) => FieldIssue[];

/**
 * The live check and spectrum of a draft, recomputed only when the document changes.
 *
 * `edited` says the draft may differ from what the server stored (an edit, or a draft restored
 * from the browser): only then are the zod shape rules loaded (shape-issues.ts, with zod) and
 * applied. A stored document already passed the server's schema, so opening the designer never
 * waits for zod.
 */
export function useLivePreview(document: Configuration, edited = true): LivePreview & ReturnType<typeof groupIssues> {
  const [shapeIssues, setShapeIssues] = useState<ShapeCheck | null>(null);
  useEffect(() => {
    if (!edited || shapeIssues) return;
    let current = true;
    void import("@/lib/designer/shape-issues").then((module) => {
      if (current) setShapeIssues(() => module.shapeIssuesOf);
    });
    return () => {
      current = false;
    };
  }, [edited, shapeIssues]);
  return useMemo(() => {
    const preview = computeLivePreview(document, shapeIssues ? { shapeIssues } : {});
    return { ...preview, ...groupIssues(preview.issues) };
  }, [document, shapeIssues]);
}
