import { describe, expect, it } from "vitest";
import { ValidationError } from "@/lib/errors";
import { parseConfigurationFile, parseConfigurationFileBytes } from "./import";

function issuesOf(run: () => unknown): ValidationError["issues"] {
  try {
    run();
  } catch (error) {
    if (error instanceof ValidationError) return error.issues;
    throw error;
  }
  throw new Error("expected a ValidationError");
}

const valid = {
  format: 1,
  title: "Probe",
  theory: "IIA",
  levels: 2,
  stacks: [{ id: "a", count: 1, worldvolume: [1, 2, 3, 4] }],
};

describe("parseConfigurationFile", () => {
  it("reads a valid file with its defaults", () => {
    expect(parseConfigurationFile(JSON.stringify(valid)).stringScaleGeV).toBeNull();
  });

  it("reports the engine's problems with well-formed stacks together with the shape's problems", () => {
    // IIA allows only even p (common practice): a D3 and a D1 are refused, as is the missing title.
    const file = { ...valid, title: undefined, stacks: [{ id: "a", count: 1, worldvolume: [1, 2, 3] }, { count: 1, worldvolume: [1] }] };
    const paths = issuesOf(() => parseConfigurationFile(JSON.stringify(file))).map((issue) => issue.path.join("."));
    expect(paths).toEqual(expect.arrayContaining(["title", "stacks.1.id", "stacks.0.worldvolume"]));
  });

  it("reads format 1 and format 2 files, with compact axes and Wilson lines in format 2", () => {
    expect(parseConfigurationFile(JSON.stringify(valid)).format).toBe(1);
    const onCircle = { ...valid, format: 2, compact: { "4": 2.5 }, stacks: [{ id: "a", count: 1, worldvolume: [1, 2, 3, 4], wilson: { "4": 1.2 } }] };
    const parsed = parseConfigurationFile(JSON.stringify(onCircle));
    expect(parsed.compact).toEqual({ "4": 2.5 });
    expect(parsed.stacks[0]?.wilson).toEqual({ "4": 1.2 });
  });

  it("names every problem of compact axes and Wilson lines at its JSON path", () => {
    const file = {
      ...valid,
      compact: { "4": 0, "9": "wide" },
      stacks: [{ id: "a", count: 1, worldvolume: [1, 2, 3, 4], wilson: { "4": 7, "5": 1 } }],
    };
    const paths = issuesOf(() => parseConfigurationFile(JSON.stringify(file))).map((issue) => issue.path.join("."));
    expect(paths).toEqual(["compact.9"]);
    const shaped = { ...file, compact: { "4": 0 } };
    const engine = issuesOf(() => parseConfigurationFile(JSON.stringify(shaped))).map((issue) => issue.path.join("."));
    expect(engine).toEqual(["format", "compact.4", "stacks.0.wilson.4", "stacks.0.wilson.5"]);
  });

  it("words a top-level list plainly", () => {
    const [issue] = issuesOf(() => parseConfigurationFile(JSON.stringify([valid, valid])));
    expect(issue?.message).toMatch(/^The file holds a list \(it starts with “\[”\) of 2 items; a configuration file is one object/);
  });

  it("names text that is not JSON by what it looks like", () => {
    expect(issuesOf(() => parseConfigurationFile("a,b,c\n1,2,3\n"))[0]?.message).toContain("a CSV table");
    expect(issuesOf(() => parseConfigurationFile("\\documentclass{article}"))[0]?.message).toContain("a LaTeX document");
    expect(issuesOf(() => parseConfigurationFile("title: Probe\ntheory: IIA\n"))[0]?.message).toContain("YAML");
    expect(issuesOf(() => parseConfigurationFile("   "))[0]?.message).toContain("an empty file");
    expect(issuesOf(() => parseConfigurationFile('{ "title": '))[0]?.message).toContain("not valid JSON");
  });

  it("says what a lone value is", () => {
    expect(issuesOf(() => parseConfigurationFile("42"))[0]?.message).toContain("a single number value");
  });
});

describe("parseConfigurationFileBytes", () => {
  it("recognises pictures and documents by their signatures (common practice)", () => {
    // PNG: 89 50 4E 47 (RFC 2083); PDF: "%PDF" (ISO 32000); JPEG: FF D8 FF (JFIF).
    expect(issuesOf(() => parseConfigurationFileBytes(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a])))[0]?.message).toContain("a PNG image");
    expect(issuesOf(() => parseConfigurationFileBytes(new TextEncoder().encode("%PDF-1.7")))[0]?.message).toContain("a PDF document");
    expect(issuesOf(() => parseConfigurationFileBytes(new Uint8Array([0xff, 0xd8, 0xff, 0xe0])))[0]?.message).toContain("a JPEG image");
  });

  it("refuses bytes that are not UTF-8 text", () => {
    expect(issuesOf(() => parseConfigurationFileBytes(new Uint8Array([0x7b, 0xc3, 0x28, 0x7d])))[0]?.message).toContain("not valid UTF-8");
  });

  it("reads a UTF-8 file with a byte order mark", () => {
    const bytes = new TextEncoder().encode(`\uFEFF${JSON.stringify(valid)}`);
    expect(parseConfigurationFileBytes(bytes).title).toBe("Probe");
  });
});
