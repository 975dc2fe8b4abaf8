import { describe, expect, it } from "vitest";
import { activitySentence, capitalise, describeActivity } from "./sentences";

describe("describeActivity", () => {
  it("puts the version of a save before the configuration", () => {
    expect(describeActivity({ action: "configuration.update", details: { version: 3 } })).toEqual({
      verb: "saved version 3 of",
      aboutConfiguration: true,
      rest: "",
    });
  });

  it("names the invited address and the role with its article", () => {
    expect(describeActivity({ action: "invitation.create", details: { email: "sam@example.org", role: "viewer" } }).verb).toBe(
      "invited sam@example.org as a viewer",
    );
    expect(describeActivity({ action: "invitation.accept", details: { role: "editor", alreadyMember: false } }).verb).toBe(
      "accepted an invitation and joined as an editor",
    );
  });

  it("says what a restore brought back and which version it became", () => {
    expect(describeActivity({ action: "configuration.restore", details: { restoredNumber: 1, version: 4 } })).toEqual({
      verb: "restored revision 1 of",
      aboutConfiguration: true,
      rest: "as version 4",
    });
  });

  it("says that someone forked a configuration and what the fork is called", () => {
    expect(describeActivity({ action: "configuration.forked", details: { forkTitle: "Wall (fork)" } })).toEqual({
      verb: "forked",
      aboutConfiguration: true,
      rest: "as \u201cWall (fork)\u201d",
    });
    expect(describeActivity({ action: "configuration.forked", details: {} }).rest).toBe("");
  });

  it("is about the group, not a configuration, for membership entries", () => {
    expect(describeActivity({ action: "membership.role_change", details: { from: "viewer", to: "editor" } })).toEqual({
      verb: "changed a member's role from viewer to editor",
      aboutConfiguration: false,
      rest: "",
    });
  });

  describe("edge cases", () => {
    it("leaves out details of the wrong type", () => {
      expect(describeActivity({ action: "configuration.update", details: { version: "3" } }).verb).toBe("saved a new version of");
      expect(describeActivity({ action: "attachment.create", details: { fileName: 7 } }).verb).toBe("attached a file to");
    });
    it("spells out an unknown key instead of showing it", () => {
      expect(describeActivity({ action: "user.password_reset", details: {} }).verb).toBe("user password reset");
    });
  });
});

describe("activitySentence", () => {
  it("reads as a sentence with the actor and the quoted title", () => {
    expect(activitySentence({ action: "configuration.update", details: { version: 2 } }, { actor: "Ben", configurationTitle: "Probe" })).toBe(
      "Ben saved version 2 of “Probe”.",
    );
  });
  it("starts with a capital when there is no actor", () => {
    expect(activitySentence({ action: "group.create", details: {} })).toBe("Created the group.");
  });
  it("falls back on the title recorded in the details, then on 'a configuration'", () => {
    expect(activitySentence({ action: "configuration.delete", details: { title: "Old" } }, { actor: "Ada" })).toBe("Ada deleted “Old”.");
    expect(activitySentence({ action: "share_link.create", details: {} }, { actor: "Ada" })).toBe("Ada created a share link to a configuration.");
  });
});

describe("capitalise", () => {
  it("upper-cases the first letter only", () => {
    expect(capitalise("saved it")).toBe("Saved it");
    expect(capitalise("")).toBe("");
  });
});
