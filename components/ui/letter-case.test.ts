import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

/*
 * Upper-casing text in CSS turns formulas into different symbols: alpha' M^2 ("α′M²") becomes a
 * capital alpha ("Α′M²"), which reads as another quantity. Headers hold formulas, so no style may
 * change letter case; write the words in the case they should be read.
 */
const roots = ["app", "components"];
const caseChanging = /\b(uppercase|lowercase|capitalize|small-caps)\b|text-transform/;

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return /\.(tsx|ts|css)$/.test(name) && !/\.test\.tsx?$/.test(name) ? [path] : [];
  });
}

describe("letter case in styles", () => {
  it("finds the style sheets and components it checks", () => {
    expect(roots.flatMap(sourceFiles).length).toBeGreaterThan(50);
  });

  it("no component or style sheet changes letter case (a capital alpha is not alpha')", () => {
    const offenders = roots
      .flatMap(sourceFiles)
      .filter((path) => readFileSync(path, "utf8").split("\n").some((line) => caseChanging.test(line) && !/^(\/\/|\/?\*)/.test(line.trim())));
    expect(offenders).toEqual([]);
  });

  it("would catch a header styled to upper-case", () => {
    expect(caseChanging.test('className="text-xs font-semibold uppercase"')).toBe(true);
    expect(caseChanging.test("h2 { text-transform: none }")).toBe(true);
    expect(caseChanging.test('className="text-xs font-semibold"')).toBe(false);
  });
});
