import { describe, expect, it } from "vitest";
import { formatJsonPath, ValidationError } from "@/lib/errors";
import { configurationSchema, spectrumRequestSchema } from "./configuration";
import { configurationTitleMaxLength } from "./limits";

const valid = {
  format: 1,
  title: "Probe D4 near a D8 wall",
  theory: "IIA",
  stringScaleGeV: null,
  levels: 6,
  stacks: [
    { id: "w", label: "wall", count: 1, anti: false, worldvolume: [1, 2, 3, 4, 5, 6, 7, 8], position: { "9": 0 } },
    { id: "p", label: "probe", count: 2, anti: false, worldvolume: [1, 2, 3, 4], position: { "5": 0, "9": 3.5 } },
  ],
};

function issuesOf(input: unknown): { path: string; message: string }[] {
  const parsed = configurationSchema.safeParse(input);
  if (parsed.success) return [];
  return ValidationError.fromZod(parsed.error).issues.map((issue) => ({ path: formatJsonPath(issue.path), message: issue.message }));
}

describe("configurationSchema", () => {
  it("accepts the product.md example and keeps it unchanged", () => {
    const parsed = configurationSchema.parse(valid);
    expect(parsed).toEqual(valid);
  });

  it("fills the optional fields with their defaults", () => {
    const parsed = configurationSchema.parse({ ...valid, stringScaleGeV: undefined, stacks: [{ id: "z", count: 1, worldvolume: [] }] });
    expect(parsed.stringScaleGeV).toBeNull();
    expect(parsed.stacks[0]).toEqual({ id: "z", label: "", count: 1, anti: false, worldvolume: [], position: {} });
  });

  it("adds the engine's domain problems at their JSON paths", () => {
    const issues = issuesOf({ ...valid, stacks: [valid.stacks[0], { ...valid.stacks[1], worldvolume: [1, 2, 3] }] });
    expect(issues).toEqual([
      { path: "stacks[1].worldvolume", message: 'Stack "p" (probe) is a D3 brane, but IIA allows only even p (D0, D2, D4, D6, D8)' },
    ]);
  });

  it("reports shape problems with their paths", () => {
    expect(issuesOf({ ...valid, format: 3 }).map((issue) => issue.path)).toEqual(["format"]);
    expect(issuesOf({ ...valid, theory: "heterotic" }).map((issue) => issue.path)).toEqual(["theory"]);
    expect(issuesOf({ ...valid, title: "  " }).map((issue) => issue.path)).toEqual(["title"]);
    const badColour = { ...valid, stacks: [{ ...valid.stacks[0], colour: "red" }] };
    expect(issuesOf(badColour).map((issue) => issue.path)).toEqual(["stacks[0].colour"]);
  });

  it("takes a title up to configurationTitleMaxLength characters after trimming", () => {
    const longest = "t".repeat(configurationTitleMaxLength);
    expect(issuesOf({ ...valid, title: `  ${longest}  ` })).toEqual([]);
    expect(issuesOf({ ...valid, title: `${longest}t` })).toEqual([
      { path: "title", message: `Use at most ${configurationTitleMaxLength} characters.` },
    ]);
  });

  it("checks only the shape of a spectrum request body, leaving the physics rules to the engine's one pass", () => {
    expect(spectrumRequestSchema.safeParse(valid).success).toBe(true);
    expect(spectrumRequestSchema.safeParse({ ...valid, levels: "many" }).success).toBe(false);
    // Out of range for the engine (levels at most 200), but a well-formed document.
    expect(spectrumRequestSchema.safeParse({ ...valid, levels: 201 }).success).toBe(true);
    expect(configurationSchema.safeParse({ ...valid, levels: 201 }).success).toBe(false);
  });
});

describe("configurationSchema: orientifold planes (format 2)", () => {
  const base = {
    format: 2,
    title: "plane",
    theory: "IIB",
    levels: 1,
    stacks: [{ id: "a", count: 16, worldvolume: [1, 2, 3, 4, 5, 6, 7, 8, 9] }],
    orientifolds: [{ id: "o", type: "O-", worldvolume: [1, 2, 3, 4, 5, 6, 7, 8, 9] }],
  };
  it("accepts a plane and fills its position", () => {
    const parsed = configurationSchema.safeParse(base);
    expect(parsed.success).toBe(true);
    expect(parsed.data?.orientifolds?.[0]?.position).toEqual({});
  });
  it("reports a bad type and a format-1 document with planes at their JSON paths", () => {
    const badType = configurationSchema.safeParse({ ...base, orientifolds: [{ ...base.orientifolds[0], type: "O" }] });
    expect(badType.error?.issues.map((issue) => issue.path)).toContainEqual(["orientifolds", 0, "type"]);
    const formatOne = configurationSchema.safeParse({ ...base, format: 1 });
    expect(formatOne.error?.issues.map((issue) => issue.path)).toContainEqual(["orientifolds"]);
  });
});
