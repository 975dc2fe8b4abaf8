import { describe, expect, it } from "vitest";
import { listRecentActivityForUser } from "@/db/queries/auth";
import { createConfiguration } from "@/db/queries/configurations";
import { forkConfiguration, listForkLinks } from "@/db/queries/forks";
import { ForbiddenError } from "@/lib/errors";
import { twoTwoBraneStacks } from "@/lib/demo-configurations";
import { createTestGroup, createTestUser } from "@/tests/fixtures/users";

// Issue 16: an author sees the forks of her configuration, in a list and in her recent activity.
describe("forks seen from the source", () => {
  it("lists each fork with whether the author may open it, and tells the author who forked it", async () => {
    const author = await createTestUser({ label: "fork-author" });
    const forker = await createTestUser({ label: "fork-forker" });
    const reader = await createTestUser({ label: "fork-reader" });
    const group = await createTestGroup(author.actor, [
      { actor: forker.actor, role: "editor" },
      { actor: reader.actor, role: "viewer" },
    ]);
    const source = await createConfiguration(author.actor, group.id, twoTwoBraneStacks, "First");
    const intoPersonal = await forkConfiguration(forker.actor, source.id, { targetGroupId: forker.personalGroupId, title: "Mine" });
    const intoGroup = await forkConfiguration(forker.actor, source.id, { targetGroupId: group.id, title: "Shared" });

    const forks = await listForkLinks(author.actor, source.id);
    expect(new Map(forks.map((fork) => [fork.id, fork.readable]))).toEqual(
      new Map([
        [intoPersonal.id, false],
        [intoGroup.id, true],
      ]),
    );
    // A viewer who did not write it does not get the list.
    await expect(listForkLinks(reader.actor, source.id)).rejects.toBeInstanceOf(ForbiddenError);

    const activity = await listRecentActivityForUser(author.actor);
    const forked = activity.filter((entry) => entry.action === "configuration.forked");
    expect(forked).toHaveLength(2);
    expect(forked.every((entry) => entry.otherActorName === "Test fork-forker" && entry.configuration?.id === source.id)).toBe(true);
    expect(forked.map((entry) => entry.details.forkTitle).sort()).toEqual(["Mine", "Shared"]);
    // The forker's own activity shows each fork once, as the new configuration.
    const own = await listRecentActivityForUser(forker.actor);
    expect(own.filter((entry) => entry.action === "configuration.forked")).toEqual([]);
    expect(own.filter((entry) => entry.action === "configuration.fork")).toHaveLength(2);
  });
});
