import { describe, expect, it } from "vitest";
import { checkConfiguration } from "@/lib/boundary";
import { configurationSchema } from "@/lib/validations/configuration";
import { starterDocument } from "./starter-document";

describe("starterDocument", () => {
  it("starts every theory with a stack the theory allows", () => {
    for (const theory of ["IIA", "IIB", "bosonic"] as const) {
      const document = starterDocument(theory, "Trial");
      expect(configurationSchema.safeParse(document).success).toBe(true);
      expect(checkConfiguration(document)).toEqual([]);
    }
  });

  it("gives IIA an even p and IIB an odd p", () => {
    // IIA carries even-p branes and IIB odd-p branes: common practice.
    expect(starterDocument("IIA", "x").stacks[0]!.worldvolume.length % 2).toBe(0);
    expect(starterDocument("IIB", "x").stacks[0]!.worldvolume.length % 2).toBe(1);
  });

  it("falls back to a title when given only spaces", () => {
    expect(starterDocument("IIB", "   ").title).toBe("Untitled configuration");
  });
});
