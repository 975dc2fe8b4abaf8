import { beforeEach, describe, expect, it, vi } from "vitest";
import { checkConfiguration } from "@/lib/boundary/check";
import { computeSpectrum } from "@/lib/boundary/spectrum";
import type { Configuration } from "@/lib/boundary/types";
import { landingDemoConfiguration } from "@/lib/demo-configurations";
import { configurationSchema } from "@/lib/validations/configuration";
import { computeLivePreview, groupIssues } from "./live-preview";
import { shapeIssuesOf } from "./shape-issues";

// The engine's checker, wrapped so each test can count how often one preview runs it.
vi.mock("@/lib/boundary/check", async (importOriginal) => {
  const actual = await importOriginal<typeof import("@/lib/boundary/check")>();
  return { ...actual, checkConfiguration: vi.fn(actual.checkConfiguration) };
});
const checker = vi.mocked(checkConfiguration);

const wrongParity: Configuration = {
  ...landingDemoConfiguration,
  stacks: landingDemoConfiguration.stacks.map((stack, index) => (index === 1 ? { ...stack, worldvolume: [1, 2] } : stack)),
};

beforeEach(() => {
  checker.mockClear();
});

describe("computeLivePreview", () => {
  it("computes the spectrum of a valid draft, the same result as computeSpectrum", () => {
    const preview = computeLivePreview(landingDemoConfiguration);
    expect(preview.issues).toEqual([]);
    expect(preview.result).toEqual(computeSpectrum(landingDemoConfiguration));
  });

  it("runs the engine's checker once for a valid draft", () => {
    computeLivePreview(landingDemoConfiguration);
    expect(checker).toHaveBeenCalledTimes(1);
  });

  it("lists an engine problem at its path, computes nothing, and runs the checker once", () => {
    const preview = computeLivePreview(wrongParity);
    expect(checker).toHaveBeenCalledTimes(1);
    expect(preview.result).toBeNull();
    expect(preview.issues.map((issue) => issue.path)).toEqual([["stacks", 1, "worldvolume"]]);
  });

  it("lists shape and engine problems together, as the API's schema does, running the checker once", () => {
    const draft = { ...wrongParity, title: "t".repeat(1000) };
    const preview = computeLivePreview(draft, { shapeIssues: shapeIssuesOf });
    expect(checker).toHaveBeenCalledTimes(1);
    expect(preview.result).toBeNull();
    const parsed = configurationSchema.safeParse(draft);
    expect(parsed.success).toBe(false);
    expect(preview.issues.map((issue) => issue.path)).toEqual(parsed.error?.issues.map((issue) => issue.path));
  });

  it("without the shape rules lists only the engine's problems (a document the server accepted)", () => {
    const preview = computeLivePreview({ ...wrongParity, title: "t".repeat(1000) });
    expect(preview.issues.map((issue) => issue.path)).toEqual([["stacks", 1, "worldvolume"]]);
  });

  it("reports the time between two readings of the given clock", () => {
    const readings = [10, 12.5];
    const preview = computeLivePreview(landingDemoConfiguration, { now: () => readings.shift() ?? Number.NaN });
    expect(preview.elapsedMs).toBe(2.5);
  });
});

describe("groupIssues", () => {
  it("groups issues by stack index and keeps the document's own issues apart", () => {
    const title = { path: ["title"], message: "title" };
    const first = { path: ["stacks", 1, "worldvolume"], message: "one" };
    const second = { path: ["stacks", 1, "count"], message: "two" };
    const { byStack, document } = groupIssues([title, first, second]);
    expect(document).toEqual([title]);
    expect([...byStack.entries()]).toEqual([[1, [first, second]]]);
  });
});
