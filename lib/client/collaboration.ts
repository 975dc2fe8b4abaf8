/**
 * react-query factories and mutations for the collaboration features: members, invitations,
 * comments, share links and attachments. Reads go through `queryOptions`; writes invalidate the
 * list they change.
 */
import { queryOptions, useMutation, useQueryClient } from "@tanstack/react-query";
import type { AttachmentDto } from "@/db/queries/attachments";
import type { CommentDto } from "@/db/queries/comments";
import type { MemberDto } from "@/db/queries/groups";
import type { InvitationDto } from "@/db/queries/invitations";
import type { ShareLinkDto } from "@/db/queries/share-links";
import type { GroupRole } from "@/db/schema";
import { apiFetch, type Jsonified } from "@/lib/client/api-client";

export type CommentJson = Jsonified<CommentDto>;
export type ShareLinkJson = Jsonified<ShareLinkDto>;
export type AttachmentJson = Jsonified<AttachmentDto>;
export type InvitationJson = Jsonified<InvitationDto>;
export type MemberJson = Jsonified<MemberDto>;

const json = (body: unknown): RequestInit => ({
  headers: { "content-type": "application/json" },
  body: JSON.stringify(body),
});

export const collaborationQueries = {
  comments: (configurationId: string) =>
    queryOptions({
      queryKey: ["configurations", configurationId, "comments"],
      queryFn: () => apiFetch<CommentJson[]>(`/api/configurations/${configurationId}/comments`),
    }),
  shareLinks: (configurationId: string) =>
    queryOptions({
      queryKey: ["configurations", configurationId, "share-links"],
      queryFn: () => apiFetch<ShareLinkJson[]>(`/api/configurations/${configurationId}/share-links`),
    }),
  attachments: (configurationId: string) =>
    queryOptions({
      queryKey: ["configurations", configurationId, "attachments"],
      queryFn: () => apiFetch<AttachmentJson[]>(`/api/configurations/${configurationId}/attachments`),
    }),
  members: (groupId: string) =>
    queryOptions({
      queryKey: ["groups", groupId, "members"],
      queryFn: () => apiFetch<MemberJson[]>(`/api/groups/${groupId}/members`),
    }),
  invitations: (groupId: string) =>
    queryOptions({
      queryKey: ["groups", groupId, "invitations"],
      queryFn: () => apiFetch<InvitationJson[]>(`/api/groups/${groupId}/invitations`),
    }),
};

export function useAddComment(configurationId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { body: string; revisionId?: string }) =>
      apiFetch<CommentJson>(`/api/configurations/${configurationId}/comments`, { method: "POST", ...json(input) }),
    onSuccess: () => client.invalidateQueries({ queryKey: collaborationQueries.comments(configurationId).queryKey }),
  });
}

export function useDeleteComment(configurationId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (commentId: string) => apiFetch<void>(`/api/comments/${commentId}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: collaborationQueries.comments(configurationId).queryKey }),
  });
}

export function useCreateShareLink(configurationId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () =>
      apiFetch<{ link: ShareLinkJson; url: string }>(`/api/configurations/${configurationId}/share-links`, { method: "POST" }),
    onSuccess: () => client.invalidateQueries({ queryKey: collaborationQueries.shareLinks(configurationId).queryKey }),
  });
}

export function useRevokeShareLink(configurationId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (shareLinkId: string) => apiFetch<ShareLinkJson>(`/api/share-links/${shareLinkId}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: collaborationQueries.shareLinks(configurationId).queryKey }),
  });
}

export function useUploadAttachment(configurationId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => {
      const form = new FormData();
      form.set("file", file);
      return apiFetch<AttachmentJson>(`/api/configurations/${configurationId}/attachments`, { method: "POST", body: form });
    },
    onSuccess: () => client.invalidateQueries({ queryKey: collaborationQueries.attachments(configurationId).queryKey }),
  });
}

export function useDeleteAttachment(configurationId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (attachmentId: string) => apiFetch<void>(`/api/attachments/${attachmentId}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: collaborationQueries.attachments(configurationId).queryKey }),
  });
}

export function useInvite(groupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { email: string; role: GroupRole }) =>
      apiFetch<{ invitation: InvitationJson; mailSent: boolean }>(`/api/groups/${groupId}/invitations`, { method: "POST", ...json(input) }),
    onSuccess: () => client.invalidateQueries({ queryKey: collaborationQueries.invitations(groupId).queryKey }),
  });
}

export function useResendInvitation(groupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) =>
      apiFetch<{ invitation: InvitationJson; mailSent: boolean }>(`/api/invitations/${invitationId}/resend`, { method: "POST" }),
    onSuccess: () => client.invalidateQueries({ queryKey: collaborationQueries.invitations(groupId).queryKey }),
  });
}

export function useRevokeInvitation(groupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => apiFetch<InvitationJson>(`/api/invitations/${invitationId}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: collaborationQueries.invitations(groupId).queryKey }),
  });
}

export function useChangeMemberRole(groupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { userId: string; role: GroupRole }) =>
      apiFetch<MemberJson>(`/api/groups/${groupId}/members/${input.userId}`, { method: "PATCH", ...json({ role: input.role }) }),
    onSuccess: () => client.invalidateQueries({ queryKey: collaborationQueries.members(groupId).queryKey }),
  });
}

export function useRemoveMember(groupId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => apiFetch<void>(`/api/groups/${groupId}/members/${userId}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: collaborationQueries.members(groupId).queryKey }),
  });
}
