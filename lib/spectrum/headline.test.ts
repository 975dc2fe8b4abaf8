import { describe, expect, it } from "vitest";
import { computeSpectrum } from "@/lib/boundary";
import { braneAntibranePair, twoTwoBraneStacks } from "@/lib/demo-configurations";
import { lightestHeadline } from "./headline";
import { lightestLevel } from "./lightest";
import { resultOverview } from "./overview";

function headlineOfFull(configuration: typeof braneAntibranePair) {
  const result = computeSpectrum(configuration);
  return lightestHeadline(
    result.lightest,
    result.sectors.map((sector) => ({ pair: sector.pair, lightest: lightestLevel(sector) })),
  );
}

describe("lightestHeadline", () => {
  it("names the stretched NS tachyon, the massless gauge multiplets and the first massive R state of a D4-antiD4 pair", () => {
    const headline = headlineOfFull(braneAntibranePair);
    // alpha' M^2 = (y / 2 pi)^2 - 1/2 at y = 1.5: the brane-antibrane GSO keeps the NS ground state
    // (physics.md "GSO projection"; Banks and Susskind 1995, from memory).
    expect(headline.tachyon?.pair).toEqual(["anti", "brane"]);
    expect(headline.tachyon?.sector).toBe("NS");
    expect(Number(headline.tachyon?.massSquared)).toBeCloseTo((1.5 / (2 * Math.PI)) ** 2 - 0.5, 10);
    // Each stack with itself: 8 NS + 8 R massless states times N^2 = 1 (Green, Schwarz and Witten
    // vol. 1, from memory), so 16 per stack and 32 in all.
    expect(headline.massless?.withChanPaton).toBe("32");
    expect(headline.massless?.pairs).toEqual(expect.arrayContaining([["brane", "brane"], ["anti", "anti"]]));
    expect(headline.massless?.complete).toBe(true);
    // The R ground state of the stretched pair is massless at y = 0, so at y = 1.5 it has alpha' M^2 = (y / 2 pi)^2.
    expect(headline.firstMassive?.sector).toBe("R");
    expect(Number(headline.firstMassive?.massSquared)).toBeCloseTo((1.5 / (2 * Math.PI)) ** 2, 10);
  });

  it("reads the same from a stored overview as from the full result", () => {
    const result = computeSpectrum(braneAntibranePair);
    const overview = resultOverview(result);
    expect(lightestHeadline(overview.lightest, overview.sectors)).toEqual(headlineOfFull(braneAntibranePair));
  });

  it("has no tachyon for two parallel D2 stacks one string length apart", () => {
    const headline = headlineOfFull(twoTwoBraneStacks);
    expect(headline.tachyon).toBeNull();
    // U(2) x U(1): (4 + 1) x (8 + 8) massless states (physics.md "Chan-Paton factors"; GSW vol. 1, from memory).
    expect(headline.massless?.withChanPaton).toBe(String(5 * 16));
    // The W-boson-like left-right strings: alpha' M^2 = (y / 2 pi)^2 at y = 1 (physics.md "Mass formula").
    expect(headline.firstMassive?.pair).toEqual(["left", "right"]);
    expect(Number(headline.firstMassive?.massSquared)).toBeCloseTo(1 / (4 * Math.PI ** 2), 10);
  });

  it("says the massless count may be cut when the list of lightest states ends before any massive state", () => {
    const state = { pair: ["a", "a"] as [string, string], sector: "NS" as const, level: "1/2", massSquared: "0", mass: 0, states: "8", withChanPaton: "8" };
    const headline = lightestHeadline([state], []);
    expect(headline.massless).toEqual({ withChanPaton: "8", pairs: [["a", "a"]], complete: false });
    expect(headline.firstMassive).toBeNull();
    expect(lightestHeadline([], []).massless).toBeNull();
  });
});
