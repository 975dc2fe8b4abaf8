import { describe, expect, it } from "vitest";
import { configurationTitleMaxLength } from "./limits";
import { deletedNoticeSchema, forkConfigurationBodySchema, listConfigurationsQuerySchema, parseIfMatch } from "./configuration-api";

describe("parseIfMatch", () => {
  it("reads a bare, quoted or weak version", () => {
    expect(parseIfMatch("3")).toBe(3);
    expect(parseIfMatch('"12"')).toBe(12);
    expect(parseIfMatch('W/"7"')).toBe(7);
  });

  it("returns null without a header and NaN for garbage", () => {
    expect(parseIfMatch(null)).toBeNull();
    expect(parseIfMatch("  ")).toBeNull();
    expect(parseIfMatch("*")).toBeNaN();
    expect(parseIfMatch("v3")).toBeNaN();
  });
});

describe("listConfigurationsQuerySchema", () => {
  it("fills defaults and coerces page numbers from the query string", () => {
    const parsed = listConfigurationsQuerySchema.parse({ page: "3", search: "  probe " });
    expect(parsed).toMatchObject({ page: 3, pageSize: 20, sort: "updated", direction: "desc", search: "probe", scope: "accessible" });
  });

  it("rejects a page size over 100 and an unknown sort", () => {
    expect(listConfigurationsQuerySchema.safeParse({ pageSize: "500" }).success).toBe(false);
    expect(listConfigurationsQuerySchema.safeParse({ sort: "colour" }).success).toBe(false);
  });
});

describe("forkConfigurationBodySchema", () => {
  it("requires a uuid target group", () => {
    expect(forkConfigurationBodySchema.safeParse({ targetGroupId: "personal" }).success).toBe(false);
    expect(forkConfigurationBodySchema.safeParse({ targetGroupId: "6f1c2f4e-8b7a-4d2e-9c3b-1a2b3c4d5e6f" }).success).toBe(true);
  });

  it("takes a fork title as long as a document title, and no longer", () => {
    const targetGroupId = "6f1c2f4e-8b7a-4d2e-9c3b-1a2b3c4d5e6f";
    const longest = "t".repeat(configurationTitleMaxLength);
    expect(forkConfigurationBodySchema.safeParse({ targetGroupId, title: longest }).success).toBe(true);
    expect(forkConfigurationBodySchema.safeParse({ targetGroupId, title: `${longest}t` }).success).toBe(false);
  });
});

describe("deletedNoticeSchema", () => {
  const deleted = "6f1c2f4e-8b7a-4d2e-9c3b-1a2b3c4d5e6f";

  it("echoes a title up to the title limit and drops a longer one", () => {
    const longest = "t".repeat(configurationTitleMaxLength);
    expect(deletedNoticeSchema.parse({ deleted, title: longest }).title).toBe(longest);
    expect(deletedNoticeSchema.parse({ deleted, title: `${longest}t` }).title).toBe("");
  });
});
