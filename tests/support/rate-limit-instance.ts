// One stand-alone "app instance" for tests/integration/rate-limit.test.ts: a separate Node process
// with its own module graph and its own pg pool, sharing only the database (DATABASE_URL).
// Usage: tsx --conditions=react-server tests/support/rate-limit-instance.ts <key> <limit> <windowMs> <hits> [leaseUnits]
// Prints one JSON line: { "ok": <accepted hits>, "refused": <refused hits>, "remainingSeen": [...] }.
import { closeDatabase } from "@/db/index";
import { consumeRateLimit } from "@/lib/server/rate-limit";

async function main(): Promise<void> {
  const [key, limit, windowMs, hits, leaseUnits = "0"] = process.argv.slice(2);
  if (!key || !limit || !windowMs || !hits) throw new Error("usage: <key> <limit> <windowMs> <hits> [leaseUnits]");
  const options = { limit: Number(limit), windowMs: Number(windowMs), leaseUnits: Number(leaseUnits) };
  const outcomes = await Promise.all(
    Array.from({ length: Number(hits) }, () => consumeRateLimit(key, options)),
  );
  await closeDatabase();
  process.stdout.write(
    `${JSON.stringify({
      ok: outcomes.filter((o) => o.ok).length,
      refused: outcomes.filter((o) => !o.ok).length,
    })}\n`,
  );
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
