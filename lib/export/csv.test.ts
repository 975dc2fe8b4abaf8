import { describe, expect, it } from "vitest";
import { makeSector, makeSpectrumResult } from "@/tests/fixtures/spectrum-result-builders";
import { neutralizeCsvFormula, quoteCsvField, spectrumCsvColumns, spectrumToCsv } from "./csv";

describe("spectrumToCsv", () => {
  const result = makeSpectrumResult(
    [
      makeSector(["w", "p"], {
        tachyonic: true,
        levels: [
          { sector: "NS", level: "0", massSquared: "-1/2", mass: null, states: "1", withChanPaton: "4", note: "kept, brane, antibrane" },
          { sector: "R", level: "0", massSquared: "0", mass: 0, states: null, withChanPaton: "16" },
        ],
      }),
    ],
    { conventions: "alpha' = 1, lengths in units of sqrt(alpha'), \"exact\" rationals." },
  );
  const lines = spectrumToCsv(result, { title: "Pair" }).split("\r\n");

  it("starts with a comment record stating the conventions and the caution", () => {
    expect(lines[0]!.startsWith("# Pair. alpha' = 1")).toBe(true);
    expect(lines[0]).toContain("check published results");
    // One unquoted field: commas in the engine's text are replaced, not quoted.
    expect(lines[0]).not.toMatch(/[",]/);
  });

  it("writes the header then one record per level row", () => {
    expect(lines[1]).toBe(spectrumCsvColumns.join(","));
    // 2 comment/header records + 2 level rows + the empty string after the final CRLF
    expect(lines).toHaveLength(5);
    // alpha_prime_mass_squared_at_y0 is N + a with the fixture's a = 0 in both sectors.
    expect(lines[2]).toBe('w,p,4,1,4,0,true,true,NS,0,-1/2,0,,1,4,"kept, brane, antibrane"');
    expect(lines[3]).toBe("w,p,4,1,4,0,true,true,R,0,0,0,0,,16,");
    expect(lines[4]).toBe("");
  });

  it("gives every record the same number of fields", () => {
    // Parse per RFC 4180 (fields only contain commas inside quotes here).
    const count = (line: string) => line.replace(/"[^"]*"/g, "x").split(",").length;
    expect(count(lines[2]!)).toBe(spectrumCsvColumns.length);
    expect(count(lines[3]!)).toBe(spectrumCsvColumns.length);
  });
});

describe("quoteCsvField", () => {
  it("leaves plain fields alone", () => {
    expect(quoteCsvField("-1/2")).toBe("-1/2");
  });

  it("quotes fields with commas, quotes and line breaks, doubling quotes (RFC 4180 section 2.6-2.7)", () => {
    expect(quoteCsvField("a,b")).toBe('"a,b"');
    expect(quoteCsvField('say "hi"')).toBe('"say ""hi"""');
    expect(quoteCsvField("two\nlines")).toBe('"two\nlines"');
    expect(quoteCsvField("cr\rhere")).toBe('"cr\rhere"');
  });
});

describe("neutralizeCsvFormula", () => {
  it("prefixes text a spreadsheet would run as a formula with an apostrophe (OWASP, CSV Injection)", () => {
    for (const cell of ["=HYPERLINK(\"https://evil.example\")", "-2+3+cmd|' /C calc'!A0", "+SUM(A1)", "@SUM(A1)", "\tx", "\rx", "-", "=1"]) {
      expect(neutralizeCsvFormula(cell)).toBe(`'${cell}`);
    }
  });

  it("keeps plain numbers, negative and fractional ones included, and ordinary text", () => {
    for (const cell of ["-1/2", "-0.25", "-1e-3", "+4", "0", "12345678901234567890", "w", "kept, brane", "a=b", ""]) {
      expect(neutralizeCsvFormula(cell)).toBe(cell);
    }
  });

  it("is applied to every cell of the spectrum CSV, stack names included", () => {
    const hostile = makeSpectrumResult([
      makeSector(["=HYPERLINK(\"https://evil.example\")", "@SUM(1)"], {
        levels: [{ sector: "NS", level: "0", massSquared: "-1/2", mass: null, states: "1", withChanPaton: "4", note: "-2+3+cmd|' /C calc'!A0" }],
      }),
    ]);
    const row = spectrumToCsv(hostile).split("\r\n")[2] ?? "";
    expect(row.startsWith(`"'=HYPERLINK(""https://evil.example"")",'@SUM(1),`)).toBe(true);
    expect(row).toContain(",-1/2,");
    expect(row.endsWith(",'-2+3+cmd|' /C calc'!A0")).toBe(true);
  });
});
