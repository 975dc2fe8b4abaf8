import { describe, expect, it, vi } from "vitest";
import { z } from "zod";
import {
  ConflictError,
  formatJsonPath,
  ForbiddenError,
  NotFoundError,
  RateLimitError,
  UnauthenticatedError,
  ValidationError,
  isDatabaseUnavailable,
  toErrorResponse,
} from "./errors";

describe("toErrorResponse", () => {
  it("maps each domain error to its status with code and message", async () => {
    const cases: [Error, number, string][] = [
      [new NotFoundError(), 404, "not_found"],
      [new ForbiddenError(), 403, "forbidden"],
      [new UnauthenticatedError(), 401, "unauthenticated"],
      [new ConflictError(7), 409, "conflict"],
      [ValidationError.at(["email"], "Taken."), 422, "validation_failed"],
      [new RateLimitError(30), 429, "rate_limited"],
    ];
    for (const [error, status, code] of cases) {
      const response = toErrorResponse(error);
      expect(response.status).toBe(status);
      const body = (await response.json()) as { error: string; message: string };
      expect(body.error).toBe(code);
      expect(body.message).toBe(error.message);
    }
  });

  it("carries the current version of a conflict and the issues of a validation error", async () => {
    expect(await toErrorResponse(new ConflictError(7)).json()).toMatchObject({ currentVersion: 7 });
    expect(await toErrorResponse(ValidationError.at(["email"], "Taken.")).json()).toMatchObject({
      issues: [{ path: ["email"], message: "Taken." }],
    });
  });

  it("sets Retry-After on 429, rounding up", () => {
    expect(toErrorResponse(new RateLimitError(2.1)).headers.get("Retry-After")).toBe("3");
  });

  it("turns a zod error into 422 with every issue's JSON path", async () => {
    const schema = z.object({ stacks: z.array(z.object({ count: z.number().int().min(1) })) });
    const parsed = schema.safeParse({ stacks: [{ count: 1 }, { count: 0 }] });
    if (parsed.success) throw new Error("expected a zod failure");
    const response = toErrorResponse(parsed.error);
    expect(response.status).toBe(422);
    const body = (await response.json()) as { issues: { path: (string | number)[] }[] };
    expect(body.issues.map((issue) => issue.path)).toEqual([["stacks", 1, "count"]]);
  });

  it("answers 503 when the database is unreachable, also through a wrapped cause", () => {
    const refused = Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:54329"), { code: "ECONNREFUSED" });
    const wrapped = new Error("Failed query: select 1", { cause: refused });
    expect(toErrorResponse(wrapped).status).toBe(503);
    expect(isDatabaseUnavailable(Object.assign(new Error("terminating connection"), { code: "57P01" }))).toBe(true);
    expect(isDatabaseUnavailable(Object.assign(new Error("duplicate key"), { code: "23505" }))).toBe(false);
  });

  it("answers 422 when PostgreSQL refuses text it cannot hold, as a net under the input checks", async () => {
    // SQLSTATE 22021 character_not_in_repertoire (a NUL byte in text) and 22P05
    // untranslatable_character (\u0000 in jsonb), PostgreSQL manual appendix A.
    for (const code of ["22021", "22P05"]) {
      const refused = Object.assign(new Error("invalid byte sequence"), { code });
      const response = toErrorResponse(new Error("Failed query: insert", { cause: refused }));
      expect(response.status).toBe(422);
      expect(((await response.json()) as { issues: { message: string }[] }).issues[0]?.message).toMatch(/NUL characters/);
    }
  });

  it("logs anything else and answers a generic 500", async () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => undefined);
    const response = toErrorResponse(new TypeError("boom"));
    expect(response.status).toBe(500);
    expect(log).toHaveBeenCalledTimes(1);
    expect(((await response.json()) as { message: string }).message).not.toContain("boom");
    log.mockRestore();
  });
});

describe("formatJsonPath", () => {
  it("writes indices in brackets and non-identifier keys quoted", () => {
    expect(formatJsonPath(["stacks", 1, "worldvolume"])).toBe("stacks[1].worldvolume");
    expect(formatJsonPath(["stacks", 0, "position", "9"])).toBe('stacks[0].position["9"]');
    expect(formatJsonPath([])).toBe("");
    expect(formatJsonPath([0])).toBe("[0]");
  });
});
