import { eq, sql } from "drizzle-orm";
import type { Configuration } from "../lib/boundary/types";
import {
  bosonicTwentyFiveWithTwentyThree,
  braneAntibranePair,
  braneAntibranePairApart,
  landingDemoConfiguration,
  probeNearSevenBrane,
  probeNearSevenBraneCloser,
  twoTwoBraneStacks,
  zeroFourBoundState,
} from "../lib/demo-configurations";
import { closeDatabase, db } from "./index";
import type { Actor } from "./queries/actor";
import type { ConfigurationDto } from "./queries/configuration-dtos";
import { createConfiguration, updateConfiguration } from "./queries/configurations";
import { forkConfiguration } from "./queries/forks";
import { createGroup, getPersonalGroup } from "./queries/groups";
import { createUser } from "./queries/users";
import * as schema from "./schema";

/*
 * Demo data of our own invented scenario (the README lists the accounts):
 *   admin@mooring.test (site admin), password harbour-admin-1
 *   Brane Engineering Group (research): ada owner, ben editor, cora viewer
 *   Open Strings Lab (lab): ian owner (instructor), sam and sky viewers (students)
 * Every other account's password is demo-password-1.
 *
 * Idempotent: a database holding only demo accounts (or none) is emptied and filled again.
 * A database with other accounts is left alone unless `--reset` is given, so restarting the
 * app never wipes real work.
 */

const demoPassword = "demo-password-1";
const demoAccounts = [
  { key: "admin", email: "admin@mooring.test", name: "Harbour Admin", password: "harbour-admin-1" },
  { key: "ada", email: "ada@mooring.test", name: "Ada Quayle", password: demoPassword },
  { key: "ben", email: "ben@mooring.test", name: "Ben Castellan", password: demoPassword },
  { key: "cora", email: "cora@mooring.test", name: "Cora Lindqvist", password: demoPassword },
  { key: "ian", email: "ian@mooring.test", name: "Ian Marsh", password: demoPassword },
  { key: "sam", email: "sam@mooring.test", name: "Sam Okafor", password: demoPassword },
  { key: "sky", email: "sky@mooring.test", name: "Sky Varga", password: demoPassword },
] as const;
type DemoKey = (typeof demoAccounts)[number]["key"];

async function main(): Promise<void> {
  const reset = process.argv.includes("--reset");
  const demoEmails: string[] = demoAccounts.map((account) => account.email);
  const [others] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(schema.users)
    .where(sql`${schema.users.email} not in ${demoEmails}`);
  if ((others?.n ?? 0) > 0 && !reset) {
    console.log(
      `Seed skipped: the database holds ${others?.n} non-demo account(s). Run \`npm run db:seed -- --reset\` to replace everything with the demo data.`,
    );
    return;
  }

  await truncateAll();
  const people = await createPeople();
  const { research, lab } = await createGroups(people);
  await createConfigurations(people, research, lab);
  console.log(`Seeded ${demoAccounts.length} accounts, 2 groups and the demo configurations.`);
}

async function truncateAll(): Promise<void> {
  const tables = [
    "audit_log",
    "rate_limit_buckets",
    "share_links",
    "attachments",
    "comments",
    "results",
    "revisions",
    "configurations",
    "invitations",
    "memberships",
    "groups",
    "auth_tokens",
    "users",
  ];
  await db.execute(sql.raw(`truncate table ${tables.map((t) => `"${t}"`).join(", ")} restart identity cascade`));
}

async function createPeople(): Promise<Record<DemoKey, Actor>> {
  const people = {} as Record<DemoKey, Actor>;
  // One at a time: bcrypt at cost 12 is CPU-bound and the machine is shared.
  for (const account of demoAccounts) {
    const created = await createUser(null, {
      email: account.email,
      name: account.name,
      password: account.password,
      emailVerified: true,
    });
    people[account.key] = { id: created.id, email: created.email, name: created.name, siteRole: created.siteRole };
  }
  // The first admin cannot be created through the DAL (only admins make admins).
  await db.update(schema.users).set({ siteRole: "admin" }).where(eq(schema.users.id, people.admin.id));
  people.admin = { ...people.admin, siteRole: "admin" };
  return people;
}

async function createGroups(people: Record<DemoKey, Actor>) {
  const research = await createGroup(people.ada, {
    name: "Brane Engineering Group",
    slug: "brane-engineering",
    kind: "research",
    description: "Probe branes, walls and brane-antibrane pairs for model building.",
  });
  const lab = await createGroup(people.ian, {
    name: "Open Strings Lab",
    slug: "open-strings-lab",
    kind: "lab",
    description: "Weekly exercises on boundary conditions and open-string spectra.",
  });
  // Memberships that invitations would normally create.
  await db.insert(schema.memberships).values([
    { groupId: research.id, userId: people.ben.id, role: "editor" },
    { groupId: research.id, userId: people.cora.id, role: "viewer" },
    { groupId: lab.id, userId: people.sam.id, role: "viewer" },
    { groupId: lab.id, userId: people.sky.id, role: "viewer" },
  ]);
  return { research, lab };
}

async function createConfigurations(
  people: Record<DemoKey, Actor>,
  research: { id: string },
  lab: { id: string },
): Promise<void> {
  const probe = await create(people.ada, research.id, probeNearSevenBraneCloser, "First placement of the probe");
  await save(people.ben, probe, probeNearSevenBrane, "Moved the probe out to y = 2 along x8");

  const pair = await create(people.ben, research.id, braneAntibranePairApart, "Pair outside the tachyonic range");
  await save(people.ben, pair, braneAntibranePair, "Brought the pair inside the critical separation");

  const harbour = await create(people.ada, research.id, landingDemoConfiguration, "Landing-page demo, saved for the group");
  await db.insert(schema.comments).values({
    configurationId: harbour.id,
    revisionId: harbour.currentRevision?.id ?? "",
    authorId: people.cora.id,
    body: "Could we add a second probe on the other side of the wall and compare the two stretched sectors?",
  });

  await create(people.ada, (await getPersonalGroup(people.ada)).id, zeroFourBoundState, "Check the D0-D4 massless content");

  const starter = await create(people.ian, lab.id, twoTwoBraneStacks, "Starter for week 1", { isStarter: true });
  await create(people.ian, lab.id, bosonicTwentyFiveWithTwentyThree, "Starter for week 2: the bosonic string", {
    isStarter: true,
  });

  const samFork = await forkConfiguration(people.sam, starter.id, {
    targetGroupId: (await getPersonalGroup(people.sam)).id,
  });
  await save(people.sam, samFork, flipToAntibrane(twoTwoBraneStacks, "right"), "Flipped the right stack to an antibrane");
  const skyFork = await forkConfiguration(people.sky, starter.id, {
    targetGroupId: (await getPersonalGroup(people.sky)).id,
  });
  await save(people.sky, skyFork, moveStack(twoTwoBraneStacks, "right", "3", 0), "Moved the stacks together");
}

async function create(
  actor: Actor,
  groupId: string,
  document: Configuration,
  message: string,
  options: { isStarter?: boolean } = {},
): Promise<ConfigurationDto> {
  return createConfiguration(actor, groupId, document, message, options);
}

async function save(
  actor: Actor,
  configuration: ConfigurationDto,
  document: Configuration,
  message: string,
): Promise<ConfigurationDto> {
  return updateConfiguration(actor, configuration.id, { expectedVersion: configuration.version, document, message });
}

function flipToAntibrane(document: Configuration, stackId: string): Configuration {
  return {
    ...document,
    stacks: document.stacks.map((stack) => (stack.id === stackId ? { ...stack, anti: true } : stack)),
  };
}

function moveStack(document: Configuration, stackId: string, axis: string, value: number): Configuration {
  return {
    ...document,
    stacks: document.stacks.map((stack) =>
      stack.id === stackId ? { ...stack, position: { ...stack.position, [axis]: value } } : stack,
    ),
  };
}

main()
  .catch((error: unknown) => {
    console.error("Seeding failed:", error);
    process.exitCode = 1;
  })
  .finally(() => closeDatabase());
