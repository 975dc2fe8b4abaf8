import { describe, expect, it } from "vitest";
import { countOf, withArticle } from "./wording";

// English agreement (common practice): one takes the singular, every other count the plural.
describe("countOf", () => {
  it("uses the singular for exactly one", () => {
    expect(countOf(1, "account")).toBe("1 account");
  });
  it("uses the plural for zero and for more than one", () => {
    expect(countOf(0, "account")).toBe("0 accounts");
    expect(countOf(2, "account")).toBe("2 accounts");
  });
  it("takes an irregular plural", () => {
    expect(countOf(1, "entry", "entries")).toBe("1 entry");
    expect(countOf(5, "entry", "entries")).toBe("5 entries");
  });
});

// "an" before a vowel sound, "a" before a consonant sound (common practice).
describe("withArticle", () => {
  it("puts an before the roles that start with a vowel", () => {
    expect(withArticle("owner")).toBe("an owner");
    expect(withArticle("editor")).toBe("an editor");
    expect(withArticle("admin")).toBe("an admin");
  });
  it("puts a before the roles that start with a consonant", () => {
    expect(withArticle("viewer")).toBe("a viewer");
    expect(withArticle("member")).toBe("a member");
  });
});
