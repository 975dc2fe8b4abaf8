import { afterAll, describe, expect, it, vi } from "vitest";
import { ServiceUnavailableError, toErrorResponse } from "@/lib/errors";
import { createPasswordHasher } from "@/lib/server/password-hashing";

// bcryptjs on this (the main) thread fails when touched: whatever hashes below ran elsewhere.
vi.mock("bcryptjs", () => {
  const refuse = () => {
    throw new Error("bcryptjs ran on the main thread");
  };
  return { default: { hash: refuse, hashSync: refuse, compare: refuse, compareSync: refuse }, hash: refuse, compare: refuse };
});

const hashers: ReturnType<typeof createPasswordHasher>[] = [];
function hasher(options?: Parameters<typeof createPasswordHasher>[0]) {
  const created = createPasswordHasher(options);
  hashers.push(created);
  return created;
}

afterAll(async () => {
  await Promise.all(hashers.map((h) => h.close()));
});

describe("createPasswordHasher", () => {
  it("hashes and checks passwords on a worker thread, never on the main thread", async () => {
    const pool = hasher({ threads: 1 });
    const hash = await pool.hash("correct horse battery", 4);
    // Modular crypt format of bcrypt (common practice): $2b$, two-digit cost, 53 characters of salt and hash.
    expect(hash).toMatch(/^\$2[ab]\$04\$[./A-Za-z0-9]{53}$/);
    expect(await pool.compare("correct horse battery", hash)).toBe(true);
    expect(await pool.compare("wrong horse battery", hash)).toBe(false);
    // The real library agrees with what the thread produced.
    const actual = await vi.importActual<typeof import("bcryptjs")>("bcryptjs");
    expect(actual.default.compareSync("correct horse battery", hash)).toBe(true);
  });

  it("refuses work past its queue at once with a 503 that says to try again, and finishes what it took", async () => {
    const pool = hasher({ threads: 1, maxQueue: 1 });
    const running = pool.hash("first", 8);
    const queued = pool.hash("second", 8);
    const refused = pool.hash("third", 8);
    await expect(refused).rejects.toBeInstanceOf(ServiceUnavailableError);
    await expect(running).resolves.toMatch(/^\$2/);
    await expect(queued).resolves.toMatch(/^\$2/);

    const response = toErrorResponse(await refused.catch((error: unknown) => error));
    expect(response.status).toBe(503);
    expect(Number(response.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(((await response.json()) as { message: string }).message).toMatch(/busy.*try again/i);
    // Once the queue has drained the pool takes work again.
    await expect(pool.compare("first", await running)).resolves.toBe(true);
  });

  it("runs jobs on several threads side by side, each answer going to its own caller", async () => {
    const pool = hasher({ threads: 2, maxQueue: 8 });
    const passwords = ["alpha one", "beta two", "gamma three", "delta four"];
    const hashes = await Promise.all(passwords.map((password) => pool.hash(password, 4)));
    const checks = await Promise.all(passwords.map((password, index) => pool.compare(password, hashes[index] ?? "")));
    expect(checks).toEqual([true, true, true, true]);
    expect(await pool.compare(passwords[0] ?? "", hashes[1] ?? "")).toBe(false);
  });
});
