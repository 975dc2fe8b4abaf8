import { randomUUID } from "node:crypto";
import { createServer, type Server, type Socket } from "node:net";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { createTestUser } from "@/tests/fixtures/users";

// Sign-up, sign-in links and password resets answer known and unknown addresses the same way and
// with the same work on the request path (issue 15, item 7): mail goes out after the answer, and
// both sign-up paths hash the password once. The SMTP server here accepts connections and never
// answers, so an action that waited for its mail would never return.

vi.mock("next/headers", () => ({ headers: async () => new Headers({ "x-mooring-client-address": "198.51.100.30" }) }));
const hashing = vi.hoisted(() => ({ hashes: 0 }));
vi.mock("@/lib/server/password-hashing", async (importOriginal) => {
  const original = await importOriginal<typeof import("@/lib/server/password-hashing")>();
  return {
    ...original,
    hashPassword: (password: string, cost: number) => {
      hashing.hashes += 1;
      return original.hashPassword(password, cost);
    },
  };
});

let silentSmtp: Server;
const connections = new Set<Socket>();

beforeAll(async () => {
  silentSmtp = createServer((socket) => {
    connections.add(socket);
    socket.on("close", () => connections.delete(socket));
  });
  await new Promise<void>((resolve) => silentSmtp.listen(0, "127.0.0.1", resolve));
  const address = silentSmtp.address();
  if (!address || typeof address === "string") throw new Error("the silent SMTP server has no port");
  // Read once, on first use, by lib/server/env.ts: nothing in this file has used it yet.
  process.env.SMTP_URL = `smtp://127.0.0.1:${address.port}`;
});

afterAll(async () => {
  for (const socket of connections) socket.destroy();
  await new Promise<void>((resolve) => silentSmtp.close(() => resolve()));
});

beforeEach(() => {
  hashing.hashes = 0;
});

function form(fields: Record<string, string>): FormData {
  const data = new FormData();
  for (const [key, value] of Object.entries(fields)) data.set(key, value);
  return data;
}

const uniqueEmail = (label: string) => `${label}-${randomUUID().slice(0, 8)}@test.mooring`;

describe("answers that do not tell which addresses have accounts", () => {
  it("sign-up: the same answer and one password hash for a new and a taken address, without waiting for mail", async () => {
    const { signUpAction } = await import("@/app/(auth)/actions");
    const { idleState } = await import("@/lib/action-state");
    const existing = await createTestUser({ label: "known" });
    const fresh = uniqueEmail("unknown");
    const fields = (email: string) => form({ name: "Probe", email, password: "probe password 1", confirmPassword: "probe password 1" });

    hashing.hashes = 0;
    const taken = await signUpAction(idleState(), fields(existing.actor.email));
    expect(hashing.hashes).toBe(1);
    hashing.hashes = 0;
    const created = await signUpAction(idleState(), fields(fresh));
    expect(hashing.hashes).toBe(1);

    expect(taken.status).toBe("success");
    expect(taken.message?.replace(existing.actor.email, "ADDRESS")).toBe(created.message?.replace(fresh, "ADDRESS"));
    expect(taken.fieldErrors).toEqual(created.fieldErrors);
  });

  it("password reset and sign-in link: the same answer for a known and an unknown address, without waiting for mail", async () => {
    const { requestPasswordResetAction, requestSignInLinkAction } = await import("@/app/(auth)/actions");
    const { idleState } = await import("@/lib/action-state");
    const existing = await createTestUser({ label: "known" });
    for (const action of [requestPasswordResetAction, requestSignInLinkAction]) {
      const known = await action(idleState(), form({ email: existing.actor.email }));
      const unknown = await action(idleState(), form({ email: uniqueEmail("unknown") }));
      expect(known.status).toBe("success");
      expect({ status: unknown.status, message: unknown.message, fieldErrors: unknown.fieldErrors }).toEqual({
        status: known.status,
        message: known.message,
        fieldErrors: known.fieldErrors,
      });
    }
  });
});
