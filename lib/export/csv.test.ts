import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { makeSector, makeSpectrumResult } from "@/tests/fixtures/spectrum-result-builders";
import { formulaCell, spectrumCsvColumns, spectrumToCsv } from "./csv";

/** Reads CSV as a strict RFC 4180 reader would (papaparse, no comment or delimiter guessing). */
function read(csv: string): Record<string, string>[] {
  const parsed = Papa.parse<Record<string, string>>(csv.replace(/\r\n$/, ""), { header: true, delimiter: ",", newline: "\r\n" });
  expect(parsed.errors).toEqual([]);
  expect(parsed.meta.fields).toEqual([...spectrumCsvColumns]);
  return parsed.data;
}

describe("spectrumToCsv", () => {
  const result = makeSpectrumResult(
    [
      makeSector(["w", "p"], {
        tachyonic: true,
        notes: ["nu = 4, \"quoted\", and a comma"],
        levels: [
          { sector: "NS", level: "0", massSquared: "-1/2", mass: null, states: "1", withChanPaton: "4", note: "kept, brane, antibrane" },
          { sector: "R", level: "0", massSquared: "0", mass: 0, states: null, withChanPaton: "16" },
        ],
      }),
    ],
    { conventions: "alpha' = 1, lengths in units of sqrt(alpha'), \"exact\" rationals." },
  );
  const csv = spectrumToCsv(result, { title: "Pair, first try", stacks: [{ id: "w", label: "wall, thick" }, { id: "p", label: "probe" }] });
  const lines = csv.split("\r\n");

  it("has no comment lines: the first record is the header, every other one data", () => {
    expect(lines[0]).toBe(spectrumCsvColumns.join(","));
    expect(lines.some((line) => line.startsWith("#"))).toBe(false);
    // header + 2 level rows + the empty string after the final CRLF
    expect(lines).toHaveLength(4);
    expect(lines[3]).toBe("");
  });

  it("puts the conventions, the caution and the title, unaltered, in the conventions column of the first row only", () => {
    const rows = read(csv);
    expect(rows).toHaveLength(2);
    expect(rows[0]?.conventions).toContain("Pair, first try. alpha' = 1, lengths in units of sqrt(alpha'), \"exact\" rationals.");
    expect(rows[0]?.conventions).toContain("check published results");
    expect(rows[1]?.conventions).toBe("");
  });

  it("keeps commas and quotes in labels and notes, quoted per RFC 4180 rather than rewritten", () => {
    const [first, second] = read(csv);
    expect(first).toMatchObject({
      stack_a: "w",
      stack_b: "p",
      stack_a_label: "wall, thick",
      stack_b_label: "probe",
      sector: "NS",
      oscillator_level: "0",
      alpha_prime_mass_squared: "-1/2",
      mass_sqrt_alpha_prime: "",
      states: "1",
      with_chan_paton: "4",
      note: "kept, brane, antibrane",
      sector_notes: "nu = 4, \"quoted\", and a comma",
    });
    expect(second).toMatchObject({ sector: "R", mass_sqrt_alpha_prime: "0", states: "", with_chan_paton: "16", note: "" });
    expect(csv).toContain('"wall, thick"');
    expect(csv).toContain('"nu = 4, ""quoted"", and a comma"');
    expect(csv).not.toContain("wall; thick");
  });

  it("writes a header and the conventions even when no sector has rows", () => {
    const rows = read(spectrumToCsv(makeSpectrumResult([])));
    expect(rows).toHaveLength(1);
    expect(rows[0]?.conventions).toContain("alpha'");
  });
});

describe("formula cells (OWASP, CSV Injection)", () => {
  it("marks text a spreadsheet would run as a formula", () => {
    for (const cell of ["=HYPERLINK(\"https://evil.example\")", "-2+3+cmd|' /C calc'!A0", "+SUM(A1)", "@SUM(A1)", "\tx", "\rx", "-", "=1"]) {
      expect(formulaCell.test(cell)).toBe(true);
    }
  });

  it("leaves plain numbers, negative and fractional ones included, and ordinary text", () => {
    for (const cell of ["-1/2", "-0.25", "-1e-3", "+4", "0", "12345678901234567890", "w", "kept, brane", "a=b", ""]) {
      expect(formulaCell.test(cell)).toBe(false);
    }
  });

  it("prefixes such cells with an apostrophe in the spectrum CSV, stack ids and notes included", () => {
    const hostile = makeSpectrumResult([
      makeSector(["=HYPERLINK(\"https://evil.example\")", "@SUM(1)"], {
        levels: [{ sector: "NS", level: "0", massSquared: "-1/2", mass: null, states: "1", withChanPaton: "4", note: "-2+3+cmd|' /C calc'!A0" }],
      }),
    ]);
    const [row] = read(spectrumToCsv(hostile));
    expect(row?.stack_a).toBe("'=HYPERLINK(\"https://evil.example\")");
    expect(row?.stack_b).toBe("'@SUM(1)");
    expect(row?.alpha_prime_mass_squared).toBe("-1/2");
    expect(row?.note).toBe("'-2+3+cmd|' /C calc'!A0");
  });
});
