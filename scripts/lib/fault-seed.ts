// Seeds the throwaway database of scripts/fault-run.mjs: one account with a password and one
// configuration per load worker. Prints one JSON line: { email, password, configurationIds }.
// Run with: tsx --conditions=react-server scripts/lib/fault-seed.ts <configurations>
import { closeDatabase } from "@/db/index";
import { createConfiguration } from "@/db/queries/configurations";
import { getPersonalGroup } from "@/db/queries/groups";
import { createUser } from "@/db/queries/users";
import { probeNearSevenBrane } from "@/lib/demo-configurations";

async function main(): Promise<void> {
  const howMany = Number(process.argv[2] ?? "4");
  const email = `fault-run-${Date.now()}@mooring.test`;
  const password = "fault-run-password";
  const account = await createUser(null, { email, name: "Fault run", password });
  const actor = { id: account.id, email: account.email, name: account.name, siteRole: "member" as const };
  const group = await getPersonalGroup(actor);
  const configurationIds: string[] = [];
  for (let i = 0; i < howMany; i += 1) {
    const document = { ...probeNearSevenBrane, title: `fault run ${i + 1}` };
    const created = await createConfiguration(actor, group.id, document, "seed");
    configurationIds.push(created.id);
  }
  await closeDatabase();
  process.stdout.write(`${JSON.stringify({ email, password, configurationIds })}\n`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
