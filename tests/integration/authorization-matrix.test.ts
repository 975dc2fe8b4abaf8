import { describe, expect, it, vi } from "vitest";
import type { Actor } from "@/db/queries/actor";
import { createApiToken } from "@/db/queries/api-tokens";
import { uploadAttachment } from "@/db/queries/attachments";
import { addComment } from "@/db/queries/comments";
import { createConfiguration } from "@/db/queries/configurations";
import { createInvitation } from "@/db/queries/invitations";
import { createShareLink } from "@/db/queries/share-links";
import { startSweep } from "@/db/queries/sweeps";
import { probeNearSevenBrane } from "@/lib/demo-configurations";
import { clientAddressHeader } from "@/scripts/lib/client-address.mjs";
import { createTestGroup, createTestUser, type TestUser } from "@/tests/fixtures/users";
import { actionFiles, actionsOf, handlersOf, routeFiles, type Method } from "@/tests/support/app-modules";
import { idleState } from "@/lib/action-state";

// Every route handler under app/api against every kind of caller, from ONE table. The route files
// are found on disk when the test runs: a new route.ts, or a new exported method, without an entry
// here fails "the table covers every route handler". Each cell calls the real handler with a mocked
// session against PostgreSQL.

vi.mock("@/lib/server/session", async () => {
  const { AsyncLocalStorage } = await import("node:async_hooks");
  const store = new AsyncLocalStorage<Actor | null>();
  return {
    getCurrentUser: async () => store.getStore() ?? null,
    runAs: <T>(actor: Actor | null, action: () => Promise<T>) => store.run(actor, action),
  };
});
// Server actions revalidate and redirect through Next; outside a request both become observable no-ops.
class RedirectSignal extends Error {
  constructor(readonly url: string) {
    super(`redirect to ${url}`);
  }
}
vi.mock("next/cache", () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));
vi.mock("next/navigation", async (importOriginal) => ({
  ...(await importOriginal<object>()),
  redirect: (url: string) => {
    throw new RedirectSignal(url);
  },
}));
const { runAs } = (await import("@/lib/server/session")) as unknown as {
  runAs: <T>(actor: Actor | null, action: () => Promise<T>) => Promise<T>;
};

const roles = ["anonymous", "nonMember", "viewer", "editor", "owner", "admin"] as const;
type Role = (typeof roles)[number];

/** A research group with one member per role, a site admin outside it, and one of every kind of record. */
interface World {
  users: Record<Exclude<Role, "anonymous">, TestUser>;
  /** A further viewer of the group whose membership the member routes change. */
  target: TestUser;
  groupId: string;
  configurationId: string;
  revisionId: string;
  attachmentId: string;
  /** Written by the editor. */
  commentId: string;
  shareLinkId: string;
  /** A pending invitation to an outside address. */
  invitationId: string;
  /** A sweep of the configuration (never computed: no worker runs here). */
  sweepId: string;
  /** A pending invitation to the acting user's own address (or a new address for anonymous), in another group. */
  acceptTokenFor: (role: Role) => Promise<string>;
  /** The owner's personal API tokens. */
  ownerTokens: { read: string; write: string };
}

async function createWorld(): Promise<World> {
  const [nonMember, viewer, editor, owner, admin, target, host] = await Promise.all([
    createTestUser({ label: "outsider" }),
    createTestUser({ label: "viewer" }),
    createTestUser({ label: "editor" }),
    createTestUser({ label: "owner" }),
    createTestUser({ label: "admin", siteRole: "admin" }),
    createTestUser({ label: "target" }),
    createTestUser({ label: "host" }),
  ]);
  const group = await createTestGroup(owner.actor, [
    { actor: viewer.actor, role: "viewer" },
    { actor: editor.actor, role: "editor" },
    { actor: target.actor, role: "viewer" },
  ]);
  const configuration = await createConfiguration(owner.actor, group.id, probeNearSevenBrane, "first");
  const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 73, 72, 68, 82]);
  const [attachment, comment, share, invitation, otherGroup, readToken, writeToken, sweep] = await Promise.all([
    uploadAttachment(editor.actor, configuration.id, { fileName: "figure.png", data: png }),
    addComment(editor.actor, configuration.id, { body: "Check the NS zero-point energy." }),
    createShareLink(owner.actor, configuration.id),
    createInvitation(owner.actor, group.id, { email: `pending-${Date.now()}-${Math.random()}@test.mooring`, role: "viewer" }),
    createTestGroup(host.actor),
    createApiToken(owner.actor, { name: "matrix read", scope: "read", expiresInDays: 7 }),
    createApiToken(owner.actor, { name: "matrix write", scope: "write", expiresInDays: 7 }),
    startSweep(owner.actor, configuration.id, { definition: sweepDefinition }),
  ]);
  const users = { nonMember, viewer, editor, owner, admin };
  return {
    users,
    target,
    groupId: group.id,
    configurationId: configuration.id,
    revisionId: configuration.currentRevision?.id ?? "",
    attachmentId: attachment.id,
    commentId: comment.id,
    shareLinkId: share.link.id,
    invitationId: invitation.invitation.id,
    ownerTokens: { read: readToken.secret, write: writeToken.secret },
    sweepId: sweep.id,
    acceptTokenFor: async (role) => {
      const email = role === "anonymous" ? `newcomer-${Date.now()}-${Math.random()}@test.mooring` : users[role].actor.email;
      return (await createInvitation(host.actor, otherGroup.id, { email, role: "viewer" })).token;
    },
  };
}

/** Two points: the probe's position on x8. */
const sweepDefinition = { format: 1 as const, dimensions: [{ kind: "position" as const, stack: "probe", axis: 8, values: { kind: "list" as const, values: [1, 2] } }] };

function actorOf(world: World, role: Role): Actor | null {
  return role === "anonymous" ? null : world.users[role].actor;
}

/** A JSON request to the handler under test. */
function json(method: Method, url: string, body?: unknown): Request {
  return new Request(`http://127.0.0.1${url}`, {
    method,
    headers: body === undefined ? {} : { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

function multipart(url: string, fields: Record<string, string | Blob>): Request {
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) {
    if (value instanceof Blob) form.set(key, value, key === "file" ? "upload.json" : key);
    else form.set(key, value);
  }
  return new Request(`http://127.0.0.1${url}`, { method: "POST", body: form });
}

type Params = Record<string, string>;
interface Cell {
  /** Builds the request and the route params for `role` in `world`. */
  request: (world: World, role: Role) => Promise<{ request: Request; params?: Params }> | { request: Request; params?: Params };
  /** Expected status per caller. */
  expect: Record<Role, number>;
}
type RouteEntry = { methods: Partial<Record<Method, Cell>> } | { excluded: string };

/** Statuses for "members may read": anonymous 401, outsiders 404 (existence hidden), members and admins 200. */
const membersRead = { anonymous: 401, nonMember: 404, viewer: 200, editor: 200, owner: 200, admin: 200 };
/** Editors, owners and admins may; viewers 403. */
const editorsWrite = (success: number) => ({ anonymous: 401, nonMember: 404, viewer: 403, editor: success, owner: success, admin: success });
/** Owners and admins may; viewers and editors 403. */
const ownersOnly = (success: number) => ({ anonymous: 401, nonMember: 404, viewer: 403, editor: 403, owner: success, admin: success });
/** Any signed-in account. */
const signedIn = (success: number) => ({ anonymous: 401, nonMember: success, viewer: success, editor: success, owner: success, admin: success });
const everyone = (success: number) => ({ anonymous: success, nonMember: success, viewer: success, editor: success, owner: success, admin: success });

const configurationPath = (w: World) => `/api/configurations/${w.configurationId}`;
const configurationParams = (w: World): Params => ({ configurationId: w.configurationId });

/** THE table: every route handler file under app/api (path relative to app/api), every exported method. */
const matrix: Record<string, RouteEntry> = {
  "auth/[...nextauth]/route.ts": {
    excluded: "next-auth's own handler (sign-in, session, CSRF token); its cookies and limits are tested in security.test.ts and sign-in-limit.test.ts",
  },
  "health/route.ts": { methods: { GET: { request: () => ({ request: json("GET", "/api/health") }), expect: everyone(200) } } },
  "openapi.json/route.ts": { methods: { GET: { request: () => ({ request: json("GET", "/api/openapi.json") }), expect: everyone(200) } } },
  "spectrum/route.ts": {
    methods: {
      POST: {
        request: (_w, role) => {
          const request = json("POST", "/api/spectrum", probeNearSevenBrane);
          request.headers.set(clientAddressHeader, `matrix-${role}-${Math.random()}`);
          return { request };
        },
        expect: everyone(200),
      },
    },
  },
  "groups/route.ts": {
    methods: {
      GET: { request: () => ({ request: json("GET", "/api/groups") }), expect: signedIn(200) },
      POST: { request: () => ({ request: json("POST", "/api/groups", { name: `Matrix group ${Math.random()}`, kind: "research" }) }), expect: signedIn(201) },
    },
  },
  "groups/[groupId]/members/route.ts": {
    methods: { GET: { request: (w) => ({ request: json("GET", `/api/groups/${w.groupId}/members`), params: { groupId: w.groupId } }), expect: membersRead } },
  },
  "groups/[groupId]/members/[userId]/route.ts": {
    methods: {
      PATCH: {
        request: (w) => ({
          request: json("PATCH", `/api/groups/${w.groupId}/members/${w.target.actor.id}`, { role: "editor" }),
          params: { groupId: w.groupId, userId: w.target.actor.id },
        }),
        expect: ownersOnly(200),
      },
      DELETE: {
        request: (w) => ({
          request: json("DELETE", `/api/groups/${w.groupId}/members/${w.target.actor.id}`),
          params: { groupId: w.groupId, userId: w.target.actor.id },
        }),
        expect: ownersOnly(204),
      },
    },
  },
  "groups/[groupId]/audit/route.ts": {
    methods: { GET: { request: (w) => ({ request: json("GET", `/api/groups/${w.groupId}/audit`), params: { groupId: w.groupId } }), expect: ownersOnly(200) } },
  },
  "groups/[groupId]/invitations/route.ts": {
    methods: {
      GET: { request: (w) => ({ request: json("GET", `/api/groups/${w.groupId}/invitations`), params: { groupId: w.groupId } }), expect: ownersOnly(200) },
      POST: {
        request: (w) => ({
          request: json("POST", `/api/groups/${w.groupId}/invitations`, { email: `invitee-${Math.random()}@test.mooring`, role: "viewer" }),
          params: { groupId: w.groupId },
        }),
        expect: ownersOnly(201),
      },
    },
  },
  "invitations/[invitationId]/route.ts": {
    methods: {
      DELETE: {
        request: (w) => ({ request: json("DELETE", `/api/invitations/${w.invitationId}`), params: { invitationId: w.invitationId } }),
        expect: ownersOnly(200),
      },
    },
  },
  "invitations/[invitationId]/resend/route.ts": {
    methods: {
      POST: {
        request: (w) => ({ request: json("POST", `/api/invitations/${w.invitationId}/resend`), params: { invitationId: w.invitationId } }),
        expect: ownersOnly(200),
      },
    },
  },
  "invitations/accept/route.ts": {
    methods: {
      // Holding the token for one's own address is the authorization; without an account, the
      // invitation creates one (201).
      POST: {
        request: async (w, role) => ({
          request: json(
            "POST",
            "/api/invitations/accept",
            role === "anonymous"
              ? { token: await w.acceptTokenFor(role), name: "New Person", password: "a long enough password" }
              : { token: await w.acceptTokenFor(role) },
          ),
        }),
        expect: { anonymous: 201, nonMember: 200, viewer: 200, editor: 200, owner: 200, admin: 200 },
      },
    },
  },
  "configurations/route.ts": {
    methods: {
      GET: { request: () => ({ request: json("GET", "/api/configurations") }), expect: signedIn(200) },
      POST: {
        request: (w) => ({ request: json("POST", "/api/configurations", { groupId: w.groupId, document: probeNearSevenBrane }) }),
        expect: editorsWrite(201),
      },
    },
  },
  "configurations/import/route.ts": {
    methods: {
      POST: {
        request: (w) => ({
          request: multipart("/api/configurations/import", { file: new Blob([JSON.stringify(probeNearSevenBrane)]), groupId: w.groupId }),
        }),
        expect: editorsWrite(201),
      },
    },
  },
  "configurations/[configurationId]/route.ts": {
    methods: {
      GET: { request: (w) => ({ request: json("GET", configurationPath(w)), params: configurationParams(w) }), expect: membersRead },
      PUT: {
        request: (w) => {
          const request = json("PUT", configurationPath(w), { document: { ...probeNearSevenBrane, title: "edited" }, message: "edit" });
          request.headers.set("if-match", '"1"');
          return { request, params: configurationParams(w) };
        },
        expect: editorsWrite(200),
      },
      DELETE: { request: (w) => ({ request: json("DELETE", configurationPath(w)), params: configurationParams(w) }), expect: editorsWrite(204) },
    },
  },
  "configurations/[configurationId]/undelete/route.ts": {
    methods: {
      POST: { request: (w) => ({ request: json("POST", `${configurationPath(w)}/undelete`), params: configurationParams(w) }), expect: editorsWrite(200) },
    },
  },
  "configurations/[configurationId]/fork/route.ts": {
    methods: {
      // Into the caller's own personal space: reading the source is what is checked.
      POST: {
        request: (w, role) => ({
          request: json("POST", `${configurationPath(w)}/fork`, {
            targetGroupId: role === "anonymous" ? w.groupId : w.users[role].personalGroupId,
          }),
          params: configurationParams(w),
        }),
        expect: { anonymous: 401, nonMember: 404, viewer: 201, editor: 201, owner: 201, admin: 201 },
      },
    },
  },
  "configurations/[configurationId]/revisions/route.ts": {
    methods: { GET: { request: (w) => ({ request: json("GET", `${configurationPath(w)}/revisions`), params: configurationParams(w) }), expect: membersRead } },
  },
  "configurations/[configurationId]/revisions/[revisionId]/route.ts": {
    methods: {
      GET: {
        request: (w) => ({
          request: json("GET", `${configurationPath(w)}/revisions/${w.revisionId}`),
          params: { configurationId: w.configurationId, revisionId: w.revisionId },
        }),
        expect: membersRead,
      },
    },
  },
  "configurations/[configurationId]/revisions/[revisionId]/result/route.ts": {
    methods: {
      GET: {
        request: (w) => ({
          request: json("GET", `${configurationPath(w)}/revisions/${w.revisionId}/result`),
          params: { configurationId: w.configurationId, revisionId: w.revisionId },
        }),
        expect: membersRead,
      },
    },
  },
  "configurations/[configurationId]/revisions/[revisionId]/result/overview/route.ts": {
    methods: {
      GET: {
        request: (w) => ({
          request: json("GET", `${configurationPath(w)}/revisions/${w.revisionId}/result/overview`),
          params: { configurationId: w.configurationId, revisionId: w.revisionId },
        }),
        expect: membersRead,
      },
    },
  },
  "configurations/[configurationId]/revisions/[revisionId]/result/sectors/route.ts": {
    methods: {
      GET: {
        request: (w) => ({
          request: json("GET", `${configurationPath(w)}/revisions/${w.revisionId}/result/sectors?limit=5`),
          params: { configurationId: w.configurationId, revisionId: w.revisionId },
        }),
        expect: membersRead,
      },
    },
  },
  "configurations/[configurationId]/revisions/[revisionId]/result/sectors/[sectorIndex]/route.ts": {
    methods: {
      GET: {
        request: (w) => ({
          request: json("GET", `${configurationPath(w)}/revisions/${w.revisionId}/result/sectors/0`),
          params: { configurationId: w.configurationId, revisionId: w.revisionId, sectorIndex: "0" },
        }),
        expect: membersRead,
      },
    },
  },
  "configurations/[configurationId]/export/route.ts": {
    methods: { GET: { request: (w) => ({ request: json("GET", `${configurationPath(w)}/export?format=csv`), params: configurationParams(w) }), expect: membersRead } },
  },
  "configurations/[configurationId]/comments/route.ts": {
    methods: {
      GET: { request: (w) => ({ request: json("GET", `${configurationPath(w)}/comments`), params: configurationParams(w) }), expect: membersRead },
      // Viewers may comment (db/queries/comments.ts).
      POST: {
        request: (w) => ({ request: json("POST", `${configurationPath(w)}/comments`, { body: "A remark." }), params: configurationParams(w) }),
        expect: { anonymous: 401, nonMember: 404, viewer: 201, editor: 201, owner: 201, admin: 201 },
      },
    },
  },
  "comments/[commentId]/route.ts": {
    methods: {
      // The author (the editor) or an owner.
      DELETE: {
        request: (w) => ({ request: json("DELETE", `/api/comments/${w.commentId}`), params: { commentId: w.commentId } }),
        expect: { anonymous: 401, nonMember: 404, viewer: 403, editor: 204, owner: 204, admin: 204 },
      },
    },
  },
  "configurations/[configurationId]/attachments/route.ts": {
    methods: {
      GET: { request: (w) => ({ request: json("GET", `${configurationPath(w)}/attachments`), params: configurationParams(w) }), expect: membersRead },
      POST: {
        request: (w) => {
          const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 73, 72, 68, 82]);
          const form = new FormData();
          form.set("file", new Blob([png], { type: "image/png" }), "plot.png");
          return { request: new Request(`http://127.0.0.1${configurationPath(w)}/attachments`, { method: "POST", body: form }), params: configurationParams(w) };
        },
        expect: editorsWrite(201),
      },
    },
  },
  "attachments/[attachmentId]/route.ts": {
    methods: {
      GET: { request: (w) => ({ request: json("GET", `/api/attachments/${w.attachmentId}`), params: { attachmentId: w.attachmentId } }), expect: membersRead },
      DELETE: {
        request: (w) => ({ request: json("DELETE", `/api/attachments/${w.attachmentId}`), params: { attachmentId: w.attachmentId } }),
        expect: editorsWrite(204),
      },
    },
  },
  "configurations/[configurationId]/share-links/route.ts": {
    methods: {
      GET: { request: (w) => ({ request: json("GET", `${configurationPath(w)}/share-links`), params: configurationParams(w) }), expect: editorsWrite(200) },
      POST: { request: (w) => ({ request: json("POST", `${configurationPath(w)}/share-links`), params: configurationParams(w) }), expect: editorsWrite(201) },
    },
  },
  "configurations/[configurationId]/sweeps/route.ts": {
    methods: {
      GET: { request: (w) => ({ request: json("GET", `${configurationPath(w)}/sweeps`), params: configurationParams(w) }), expect: membersRead },
      POST: {
        request: (w) => ({ request: json("POST", `${configurationPath(w)}/sweeps`, { definition: sweepDefinition }), params: configurationParams(w) }),
        expect: editorsWrite(201),
      },
    },
  },
  "sweeps/[sweepId]/route.ts": {
    methods: { GET: { request: (w) => ({ request: json("GET", `/api/sweeps/${w.sweepId}`), params: { sweepId: w.sweepId } }), expect: membersRead } },
  },
  "sweeps/[sweepId]/points/route.ts": {
    methods: { GET: { request: (w) => ({ request: json("GET", `/api/sweeps/${w.sweepId}/points`), params: { sweepId: w.sweepId } }), expect: membersRead } },
  },
  "sweeps/[sweepId]/export/route.ts": {
    methods: {
      GET: { request: (w) => ({ request: json("GET", `/api/sweeps/${w.sweepId}/export?format=csv`), params: { sweepId: w.sweepId } }), expect: membersRead },
    },
  },
  // Cancel and resume are idempotent, so the cells may share one sweep in any order.
  "sweeps/[sweepId]/cancel/route.ts": {
    methods: {
      POST: { request: (w) => ({ request: json("POST", `/api/sweeps/${w.sweepId}/cancel`), params: { sweepId: w.sweepId } }), expect: editorsWrite(200) },
    },
  },
  "sweeps/[sweepId]/resume/route.ts": {
    methods: {
      POST: { request: (w) => ({ request: json("POST", `/api/sweeps/${w.sweepId}/resume`), params: { sweepId: w.sweepId } }), expect: editorsWrite(200) },
    },
  },
  "share-links/[shareLinkId]/route.ts": {
    methods: {
      DELETE: {
        request: (w) => ({ request: json("DELETE", `/api/share-links/${w.shareLinkId}`), params: { shareLinkId: w.shareLinkId } }),
        expect: editorsWrite(200),
      },
    },
  },
};


/**
 * A cell that succeeds with PUT, PATCH or DELETE changes or removes the record it is about, so it
 * gets a world of its own.
 */
const needsOwnWorld = (method: Method, status: number) => method !== "GET" && method !== "POST" && status < 400;

describe("authorization matrix", () => {
  it("the table covers every route handler file under app/api and every method it exports", async () => {
    const files = routeFiles();
    expect(files.length).toBeGreaterThan(20);
    expect(files.filter((file) => !(file in matrix))).toEqual([]);
    expect(Object.keys(matrix).filter((file) => !files.includes(file))).toEqual([]);
    for (const file of files) {
      const entry = matrix[file];
      if (!entry || "excluded" in entry) continue;
      const exported = Object.keys(await handlersOf(file)).sort();
      expect({ file, methods: exported }).toEqual({ file, methods: Object.keys(entry.methods).sort() });
    }
  });

  // A cell that succeeds with PUT, PATCH or DELETE gets a world of its own; every other cell (reads, creates, refusals) shares one world, so the
  // order of the cells does not matter. A refusal that wrongly wrote would show in later cells too.
  let shared: Promise<World> | undefined;
  for (const [file, entry] of Object.entries(matrix)) {
    if ("excluded" in entry) continue;
    describe(file, () => {
      for (const [method, cell] of Object.entries(entry.methods) as [Method, Cell][]) {
        for (const role of roles) {
          const status = cell.expect[role];
          it(`${method} as ${role} -> ${status}`, async () => {
            const world = needsOwnWorld(method, status) ? await createWorld() : await (shared ??= createWorld());
            const handler = (await handlersOf(file))[method];
            if (!handler) throw new Error(`${file} does not export ${method}`);
            const { request, params = {} } = await cell.request(world, role);
            const response = await runAs(actorOf(world, role), () => handler(request, { params: Promise.resolve(params) }));
            const body = response.status >= 400 ? await response.text() : "";
            expect({ status: response.status, body: body.slice(0, 200) }).toMatchObject({ status });
            // Whatever a signed-in caller gets back, success or refusal, no cache may keep it. The
            // OpenAPI document reads no caller: everyone gets the same public document.
            if (role !== "anonymous" && file !== "openapi.json/route.ts") {
              expect(response.headers.get("cache-control")).toBe("private, no-store");
            }
          });
        }
      }
    });
  }
});

// ---------------------------------------------------------------------------------------------
// Personal API tokens against the same table: every route handler is called with the owner's
// read-only and read-write tokens in `Authorization: Bearer` (and no session). Routes that take
// tokens (the configuration routes and the compute) answer as they answer the owner's session,
// except that a read-only token is refused (403) by every route that writes; every other route
// refuses tokens (403), apart from the health check and the API document, which read no caller at all. With a session
// cookie too, the token alone counts.
// ---------------------------------------------------------------------------------------------

/**
 * The routes that accept tokens, as the issues name them (not read from the app's own policy):
 * configurations, the compute, and a sweep's routes (a script follows the sweep it started).
 */
const tokenRoutes = (file: string) =>
  file === "spectrum/route.ts" || file === "configurations/route.ts" || file.startsWith("configurations/") || file.startsWith("sweeps/");
/** Writing methods, except the stateless compute, which changes nothing. */
const writes = (file: string, method: Method) => method !== "GET" && file !== "spectrum/route.ts";

describe("authorization matrix with API tokens", () => {
  let shared: Promise<World> | undefined;
  for (const [file, entry] of Object.entries(matrix)) {
    if ("excluded" in entry) continue;
    describe(file, () => {
      for (const [method, cell] of Object.entries(entry.methods) as [Method, Cell][]) {
        for (const scope of ["read", "write"] as const) {
          const ignoresCaller = file === "health/route.ts" || file === "openapi.json/route.ts";
          const status = !ignoresCaller && (!tokenRoutes(file) || (scope === "read" && writes(file, method))) ? 403 : cell.expect.owner;
          it(`${method} with the owner's ${scope} token -> ${status}`, async () => {
            const world = needsOwnWorld(method, status) ? await createWorld() : await (shared ??= createWorld());
            const handler = (await handlersOf(file))[method];
            if (!handler) throw new Error(`${file} does not export ${method}`);
            const { request, params = {} } = await cell.request(world, "owner");
            request.headers.set("authorization", `Bearer ${world.ownerTokens[scope]}`);
            // The admin's session beside a read-only token must not lend it the right to write.
            const session = scope === "read" ? world.users.admin.actor : null;
            const response = await runAs(session, () => handler(request, { params: Promise.resolve(params) }));
            const body = response.status >= 400 ? await response.text() : "";
            expect({ status: response.status, body: body.slice(0, 200) }).toMatchObject({ status });
          });
        }
      }
    });
  }
});

// ---------------------------------------------------------------------------------------------
// Server actions: every exported function of every "use server" file under app/, from one table.
// An action answers with form state rather than a status, so a cell expects "ok" (success, a
// redirect, or a result) or "refused" (an error state whose message is a deliberate refusal).
// ---------------------------------------------------------------------------------------------

type Outcome = "ok" | "refused";
interface ActionCell {
  /** Calls the action for `role` in `world` (inside the mocked session). */
  call: (action: (...args: never[]) => Promise<unknown>, world: World, role: Role) => Promise<unknown>;
  expect: Record<Role, Outcome>;
  /** True when a successful call changes the record it is about (it then gets a world of its own). */
  consumes?: boolean;
}
type ActionEntry = { actions: Record<string, ActionCell> } | { excluded: string };

function form(fields: Record<string, string>): FormData {
  const data = new FormData();
  for (const [key, value] of Object.entries(fields)) data.set(key, value);
  return data;
}

const okFor = (allowed: Role[]): Record<Role, Outcome> =>
  Object.fromEntries(roles.map((role) => [role, allowed.includes(role) ? "ok" : "refused"])) as Record<Role, Outcome>;
const signedInRoles: Role[] = ["nonMember", "viewer", "editor", "owner", "admin"];

/** A lab group (owner, editor, viewer as in the world's group) with one configuration, for lab-only actions. */
async function labConfiguration(world: World): Promise<{ id: string; slug: string }> {
  const lab = await createTestGroup(
    world.users.owner.actor,
    [
      { actor: world.users.viewer.actor, role: "viewer" },
      { actor: world.users.editor.actor, role: "editor" },
    ],
    "lab",
  );
  const created = await createConfiguration(world.users.owner.actor, lab.id, probeNearSevenBrane, "starter");
  return { id: created.id, slug: lab.slug };
}

/** THE table of server actions (path relative to app/). */
const actionMatrix: Record<string, ActionEntry> = {
  "(auth)/actions.ts": {
    excluded: "public forms used before signing in (sign-up, e-mailed links, reset with a token); tested in auth-actions.test.ts and sign-in-limit.test.ts",
  },
  "(workspace)/account/actions.ts": {
    actions: {
      createApiTokenAction: {
        call: (action) => action(...([idleState(), form({ name: "Matrix script", scope: "read", expiresInDays: "30" })] as never[])),
        expect: okFor(signedInRoles),
      },
      // Only one's own token: the owner's token is "no such token" to everyone else, admins included.
      revokeApiTokenAction: {
        call: async (action, world) => {
          const token = await createApiToken(world.users.owner.actor, { name: "to revoke", scope: "write", expiresInDays: 7 });
          return action(...([token.token.id] as never[]));
        },
        expect: okFor(["owner"]),
      },
      updateAccountNameAction: { call: (action) => action(...([idleState(), form({ name: "Renamed Person" })] as never[])), expect: okFor(signedInRoles) },
      changePasswordAction: {
        // Test accounts have no password yet, so no current password is asked for.
        call: (action) =>
          action(...([idleState(), form({ currentPassword: "", newPassword: "a brand new password", confirmPassword: "a brand new password" })] as never[])),
        expect: okFor(signedInRoles),
      },
      signOutEverywhereAction: { call: (action) => action(...([] as never[])), expect: okFor(signedInRoles) },
    },
  },
  "(workspace)/admin/actions.ts": {
    actions: {
      changeSiteRoleAction: {
        call: (action, world) => action(...([idleState(), form({ userId: world.target.actor.id, siteRole: "admin" })] as never[])),
        expect: okFor(["admin"]),
      },
    },
  },
  "(workspace)/groups/actions.ts": {
    actions: {
      createGroupAction: {
        call: (action) => action(...([idleState(), form({ name: `Action group ${Math.random()}`, kind: "research", slug: "", description: "" })] as never[])),
        expect: okFor(signedInRoles),
      },
      forkToPersonalSpaceAction: { call: (action, world) => action(...([world.configurationId] as never[])), expect: okFor(["viewer", "editor", "owner", "admin"]) },
      setStarterAction: {
        call: async (action, world) => {
          const lab = await labConfiguration(world);
          return action(...([lab.id, true, lab.slug] as never[]));
        },
        expect: okFor(["owner", "admin"]),
      },
    },
  },
  "(workspace)/configurations/[configurationId]/history/actions.ts": {
    actions: {
      restoreRevisionAction: {
        call: (action, world) => action(...([world.configurationId, world.revisionId, 1] as never[])),
        expect: okFor(["editor", "owner", "admin"]),
        consumes: true,
      },
    },
  },
};

/** "ok" or "refused", from what an action returned or threw. */
async function outcomeOf(run: () => Promise<unknown>): Promise<{ outcome: Outcome; detail: string }> {
  try {
    const value = (await run()) as { status?: string; message?: string | null; error?: string } | undefined;
    if (value && (value.status === "error" || typeof value.error === "string")) {
      const message = value.message ?? value.error ?? "";
      return { outcome: "refused", detail: `${message} ${JSON.stringify((value as { fieldErrors?: unknown }).fieldErrors ?? {})}` };
    }
    return { outcome: "ok", detail: JSON.stringify(value ?? null).slice(0, 120) };
  } catch (error) {
    if (error instanceof RedirectSignal) return { outcome: "ok", detail: error.message };
    throw error;
  }
}

describe("server action matrix", () => {
  it("the table covers every server action file under app/ and every function it exports", async () => {
    const files = actionFiles();
    expect(files.length).toBeGreaterThan(2);
    expect(files.filter((file) => !(file in actionMatrix))).toEqual([]);
    expect(Object.keys(actionMatrix).filter((file) => !files.includes(file))).toEqual([]);
    for (const file of files) {
      const entry = actionMatrix[file];
      if (!entry || "excluded" in entry) continue;
      const exported = Object.keys(await actionsOf(file)).sort();
      expect({ file, actions: exported }).toEqual({ file, actions: Object.keys(entry.actions).sort() });
    }
  });

  let shared: Promise<World> | undefined;
  for (const [file, entry] of Object.entries(actionMatrix)) {
    if ("excluded" in entry) continue;
    describe(file, () => {
      for (const [name, cell] of Object.entries(entry.actions)) {
        for (const role of roles) {
          const expected = cell.expect[role];
          it(`${name} as ${role} -> ${expected}`, async () => {
            // Account actions change the acting user, so each of their cells gets its own world too.
            const own = (cell.consumes && expected === "ok") || file.includes("account/");
            const world = own ? await createWorld() : await (shared ??= createWorld());
            const action = (await actionsOf(file))[name];
            if (!action) throw new Error(`${file} does not export ${name}`);
            const result = await runAs(actorOf(world, role), () => outcomeOf(() => cell.call(action, world, role)));
            expect({ outcome: result.outcome, detail: result.detail }).toMatchObject({ outcome: expected });
            // A refusal is deliberate, never the catch-all for an unexpected error.
            if (result.outcome === "refused") expect(result.detail).not.toMatch(/Something went wrong/);
          });
        }
      }
    });
  }
});
