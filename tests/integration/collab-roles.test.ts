import { describe, expect, it, vi } from "vitest";
import type { Actor } from "@/db/queries/actor";
import { addComment } from "@/db/queries/comments";
import { createConfiguration } from "@/db/queries/configurations";
import { createInvitation } from "@/db/queries/invitations";
import { createShareLink } from "@/db/queries/share-links";
import { uploadAttachment } from "@/db/queries/attachments";
import { braneAntibranePair } from "@/lib/demo-configurations";
import { createTestGroup, createTestUser } from "@/tests/fixtures/users";

const session = vi.hoisted(() => ({ actor: null as Actor | null }));
vi.mock("@/lib/server/session", () => ({ getCurrentUser: async () => session.actor }));

const groupsRoute = await import("@/app/api/groups/route");
const membersRoute = await import("@/app/api/groups/[groupId]/members/route");
const memberRoute = await import("@/app/api/groups/[groupId]/members/[userId]/route");
const invitationsRoute = await import("@/app/api/groups/[groupId]/invitations/route");
const invitationRoute = await import("@/app/api/invitations/[invitationId]/route");
const resendRoute = await import("@/app/api/invitations/[invitationId]/resend/route");
const auditRoute = await import("@/app/api/groups/[groupId]/audit/route");
const commentsRoute = await import("@/app/api/configurations/[configurationId]/comments/route");
const commentRoute = await import("@/app/api/comments/[commentId]/route");
const shareLinksRoute = await import("@/app/api/configurations/[configurationId]/share-links/route");
const shareLinkRoute = await import("@/app/api/share-links/[shareLinkId]/route");
const attachmentsRoute = await import("@/app/api/configurations/[configurationId]/attachments/route");
const attachmentRoute = await import("@/app/api/attachments/[attachmentId]/route");
const exportRoute = await import("@/app/api/configurations/[configurationId]/export/route");
const importRoute = await import("@/app/api/configurations/import/route");

const pngBytes = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0]);

function request(method: string, body?: unknown): Request {
  if (body instanceof FormData) return new Request("http://test.local/x", { method, body });
  return new Request("http://test.local/x", {
    method,
    headers: body === undefined ? {} : { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

function params<T extends Record<string, string>>(values: T) {
  return { params: Promise.resolve(values) };
}

function pngForm(): FormData {
  const form = new FormData();
  form.set("file", new Blob([pngBytes]), "figure.png");
  return form;
}

/** One row of the matrix: who calls, and the status they must get. */
type Caller = "anonymous" | "outsider" | "viewer" | "editor" | "owner";

async function world() {
  const [owner, editor, viewer, otherViewer, outsider] = await Promise.all([
    createTestUser({ label: "owner" }),
    createTestUser({ label: "editor" }),
    createTestUser({ label: "viewer" }),
    createTestUser({ label: "viewer2" }),
    createTestUser({ label: "outsider" }),
  ]);
  const group = await createTestGroup(owner.actor, [
    { actor: editor.actor, role: "editor" },
    { actor: viewer.actor, role: "viewer" },
    { actor: otherViewer.actor, role: "viewer" },
  ]);
  const configuration = await createConfiguration(owner.actor, group.id, braneAntibranePair, "First");
  const invitation = await createInvitation(owner.actor, group.id, { email: "invitee@test.mooring", role: "viewer" });
  const comment = await addComment(otherViewer.actor, configuration.id, { body: "mine" });
  const share = await createShareLink(owner.actor, configuration.id);
  const attachment = await uploadAttachment(owner.actor, configuration.id, { fileName: "figure.png", data: pngBytes });
  const actors: Record<Caller, Actor | null> = {
    anonymous: null,
    outsider: outsider.actor,
    viewer: viewer.actor,
    editor: editor.actor,
    owner: owner.actor,
  };
  return { group, configuration, invitation, comment, share, attachment, actors, owner, otherViewer };
}

describe("collaboration routes by role", () => {
  it("answer 401 without a session, 404 to outsiders and 403 to roles that are too weak", async () => {
    const w = await world();
    const g = params({ groupId: w.group.id });
    const c = params({ configurationId: w.configuration.id });
    const cases: Array<{ name: string; call: () => Promise<Response>; expected: Partial<Record<Caller, number>> }> = [
      { name: "POST /api/groups", call: () => groupsRoute.POST(request("POST", { name: "New lab", kind: "lab" })), expected: { anonymous: 401 } },
      { name: "GET members", call: () => membersRoute.GET(request("GET"), g), expected: { anonymous: 401, outsider: 404, viewer: 200 } },
      {
        name: "DELETE another member",
        call: () => memberRoute.DELETE(request("DELETE"), params({ groupId: w.group.id, userId: w.otherViewer.actor.id })),
        expected: { anonymous: 401, outsider: 404, viewer: 403, editor: 403 },
      },
      { name: "GET invitations", call: () => invitationsRoute.GET(request("GET"), g), expected: { anonymous: 401, outsider: 404, viewer: 403, editor: 403, owner: 200 } },
      {
        name: "POST invitations",
        call: () => invitationsRoute.POST(request("POST", { email: "x@test.mooring", role: "viewer" }), g),
        expected: { anonymous: 401, outsider: 404, viewer: 403, editor: 403 },
      },
      {
        name: "DELETE invitation",
        call: () => invitationRoute.DELETE(request("DELETE"), params({ invitationId: w.invitation.invitation.id })),
        expected: { anonymous: 401, outsider: 404, viewer: 403, editor: 403 },
      },
      {
        name: "POST resend",
        call: () => resendRoute.POST(request("POST"), params({ invitationId: w.invitation.invitation.id })),
        expected: { anonymous: 401, outsider: 404, viewer: 403, editor: 403 },
      },
      { name: "GET audit", call: () => auditRoute.GET(request("GET"), g), expected: { anonymous: 401, outsider: 404, viewer: 403, editor: 403, owner: 200 } },
      { name: "GET comments", call: () => commentsRoute.GET(request("GET"), c), expected: { anonymous: 401, outsider: 404, viewer: 200 } },
      { name: "POST comment", call: () => commentsRoute.POST(request("POST", { body: "hi" }), c), expected: { anonymous: 401, outsider: 404, viewer: 201 } },
      {
        name: "DELETE someone else's comment",
        call: () => commentRoute.DELETE(request("DELETE"), params({ commentId: w.comment.id })),
        expected: { anonymous: 401, outsider: 404, viewer: 403, editor: 403 },
      },
      { name: "GET share links", call: () => shareLinksRoute.GET(request("GET"), c), expected: { anonymous: 401, outsider: 404, viewer: 403, editor: 200 } },
      { name: "POST share link", call: () => shareLinksRoute.POST(request("POST"), c), expected: { anonymous: 401, outsider: 404, viewer: 403, editor: 201 } },
      {
        name: "DELETE share link",
        call: () => shareLinkRoute.DELETE(request("DELETE"), params({ shareLinkId: w.share.link.id })),
        expected: { anonymous: 401, outsider: 404, viewer: 403 },
      },
      { name: "GET attachments", call: () => attachmentsRoute.GET(request("GET"), c), expected: { anonymous: 401, outsider: 404, viewer: 200 } },
      { name: "POST attachment", call: () => attachmentsRoute.POST(request("POST", pngForm()), c), expected: { anonymous: 401, outsider: 404, viewer: 403, editor: 201 } },
      {
        name: "GET attachment",
        call: () => attachmentRoute.GET(request("GET"), params({ attachmentId: w.attachment.id })),
        expected: { anonymous: 401, outsider: 404, viewer: 200 },
      },
      {
        name: "DELETE attachment",
        call: () => attachmentRoute.DELETE(request("DELETE"), params({ attachmentId: w.attachment.id })),
        expected: { anonymous: 401, outsider: 404, viewer: 403 },
      },
      {
        name: "GET export",
        call: () => exportRoute.GET(new Request("http://test.local/x?format=json"), c),
        expected: { anonymous: 401, outsider: 404, viewer: 200 },
      },
      { name: "POST import", call: () => importRoute.POST(request("POST", pngForm())), expected: { anonymous: 401 } },
    ];
    const failures: string[] = [];
    for (const testCase of cases) {
      for (const [caller, status] of Object.entries(testCase.expected) as Array<[Caller, number]>) {
        session.actor = w.actors[caller];
        const response = await testCase.call();
        if (response.status !== status) failures.push(`${testCase.name} as ${caller}: ${response.status}, expected ${status}`);
      }
    }
    session.actor = null;
    expect(failures).toEqual([]);
  });
});
