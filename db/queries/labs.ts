import "server-only";
import { and, desc, eq, inArray, isNull } from "drizzle-orm";
import { ValidationError } from "../../lib/errors";
import { db } from "../index";
import { configurations, groups, memberships, users } from "../schema";
import { assertUuid, requireGroupRole, type Actor } from "./actor";

/** One student's fork of a starter, with the key results the instructor compares. */
export interface StarterForkDto {
  configurationId: string;
  title: string;
  student: { id: string; name: string };
  /** True when the fork preserves some supersymmetry (supercharges > 0; type II only). */
  supersymmetric: boolean;
  supercharges: number | null;
  tachyonic: boolean;
  lightestMassSquared: number | null;
  version: number;
  updatedAt: Date;
}

/** A starter configuration with every fork made from it by the lab's members. */
export interface StarterComparisonDto {
  starterId: string;
  title: string;
  supercharges: number | null;
  tachyonic: boolean;
  lightestMassSquared: number | null;
  forks: StarterForkDto[];
}

/**
 * The instructor's side-by-side view: per starter of a lab, every member's fork (wherever it
 * lives, usually their personal space) with supersymmetry, tachyons, lightest alpha' M^2 and the
 * last change. Owners and editors of the lab only; students see their own forks in their space.
 * Only the summary columns are returned, never the forks' documents.
 */
export async function listStarterForks(actor: Actor | null, labGroupId: string): Promise<StarterComparisonDto[]> {
  assertUuid(labGroupId, "group");
  await requireGroupRole(db, actor, labGroupId, "editor");
  const [lab] = await db.select({ kind: groups.kind }).from(groups).where(eq(groups.id, labGroupId)).limit(1);
  if (lab?.kind !== "lab") throw ValidationError.at(["groupId"], "Only labs have starter configurations.");

  const starters = await db
    .select({
      id: configurations.id,
      title: configurations.title,
      supercharges: configurations.supercharges,
      tachyonic: configurations.tachyonic,
      lightestMassSquared: configurations.lightestMassSquared,
    })
    .from(configurations)
    .where(and(eq(configurations.groupId, labGroupId), eq(configurations.isStarter, true), isNull(configurations.deletedAt)))
    .orderBy(configurations.title);
  if (starters.length === 0) return [];

  const forks = await db
    .select({
      configurationId: configurations.id,
      starterId: configurations.forkedFromConfigurationId,
      title: configurations.title,
      studentId: users.id,
      studentName: users.name,
      supercharges: configurations.supercharges,
      tachyonic: configurations.tachyonic,
      lightestMassSquared: configurations.lightestMassSquared,
      version: configurations.version,
      updatedAt: configurations.updatedAt,
    })
    .from(configurations)
    .innerJoin(users, eq(users.id, configurations.createdBy))
    // Only forks by people who are (still) members of the lab.
    .innerJoin(memberships, and(eq(memberships.userId, configurations.createdBy), eq(memberships.groupId, labGroupId)))
    .where(
      and(
        inArray(
          configurations.forkedFromConfigurationId,
          starters.map((starter) => starter.id),
        ),
        isNull(configurations.deletedAt),
      ),
    )
    .orderBy(users.name, desc(configurations.updatedAt));

  return starters.map((starter) => ({
    starterId: starter.id,
    title: starter.title,
    supercharges: starter.supercharges,
    tachyonic: starter.tachyonic,
    lightestMassSquared: starter.lightestMassSquared,
    forks: forks
      .filter((fork) => fork.starterId === starter.id)
      .map((fork) => ({
        configurationId: fork.configurationId,
        title: fork.title,
        student: { id: fork.studentId, name: fork.studentName },
        supersymmetric: (fork.supercharges ?? 0) > 0,
        supercharges: fork.supercharges,
        tachyonic: fork.tachyonic,
        lightestMassSquared: fork.lightestMassSquared,
        version: fork.version,
        updatedAt: fork.updatedAt,
      })),
  }));
}
