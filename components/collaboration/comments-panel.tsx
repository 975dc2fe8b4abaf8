"use client";

import { useQuery } from "@tanstack/react-query";
import { useState, type FormEvent } from "react";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Skeleton } from "@/components/ui/skeleton";
import { Textarea } from "@/components/ui/textarea";
import { formatDateTime } from "@/lib/format-date";
import { collaborationQueries, useAddComment, useDeleteComment } from "@/lib/client/collaboration";
import { commentMaxLength } from "@/lib/validations/comment";

export interface CommentsPanelProps {
  configurationId: string;
  /** The revision being viewed; new comments are tied to it. */
  revisionId?: string;
  revisionNumber?: number;
}

/** Discussion of a configuration; each comment names the revision it was written on. Every member may comment. */
export function CommentsPanel({ configurationId, revisionId, revisionNumber }: CommentsPanelProps) {
  const comments = useQuery(collaborationQueries.comments(configurationId));
  const add = useAddComment(configurationId);
  const remove = useDeleteComment(configurationId);
  const [body, setBody] = useState("");

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (!body.trim()) return;
    add.mutate({ body, revisionId }, { onSuccess: () => setBody("") });
  }

  return (
    <section aria-labelledby="comments-title" className="grid gap-4">
      <h2 id="comments-title" className="text-base font-semibold">
        Comments
      </h2>
      {comments.isPending ? (
        <div className="grid gap-2" aria-busy="true" aria-label="Loading comments">
          <Skeleton className="h-12 w-full" />
          <Skeleton className="h-12 w-full" />
        </div>
      ) : comments.isError ? (
        <Alert variant="danger">{comments.error.message}</Alert>
      ) : comments.data.length === 0 ? (
        <p className="text-sm text-muted-foreground">No comments yet. Questions and notes for your collaborators go here.</p>
      ) : (
        <ol className="grid gap-3" aria-label="Comments, oldest first">
          {comments.data.map((comment) => (
            <li key={comment.id} className="rounded-md border border-border bg-surface px-4 py-3">
              <div className="flex flex-wrap items-center gap-2 text-xs text-muted-foreground">
                <span className="font-medium text-foreground">{comment.authorName}</span>
                <time dateTime={comment.createdAt}>{formatDateTime(comment.createdAt)}</time>
                <Badge variant={comment.revisionNumber === revisionNumber ? "accent" : "outline"}>on revision {comment.revisionNumber}</Badge>
                {comment.canDelete ? (
                  <Button
                    variant="link"
                    className="ml-auto text-xs"
                    onClick={() => {
                      if (window.confirm("Delete this comment?")) remove.mutate(comment.id);
                    }}
                  >
                    Delete
                  </Button>
                ) : null}
              </div>
              <p className="mt-1.5 text-sm whitespace-pre-wrap">{comment.body}</p>
            </li>
          ))}
        </ol>
      )}
      <form onSubmit={onSubmit} noValidate className="grid gap-2">
        <Field
          id="comment-body"
          label={revisionNumber ? `Comment on revision ${revisionNumber}` : "Comment"}
          hint={`${body.length}/${commentMaxLength}`}
          error={add.error?.message}
        >
          <Textarea value={body} onChange={(event) => setBody(event.target.value)} maxLength={commentMaxLength} rows={3} />
        </Field>
        <div className="flex justify-end">
          <Button type="submit" pending={add.isPending} disabled={!body.trim()}>
            Add comment
          </Button>
        </div>
      </form>
    </section>
  );
}
