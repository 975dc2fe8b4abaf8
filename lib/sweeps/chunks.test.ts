import { describe, expect, it } from "vitest";
import { chunkCount, chunkLimits, chunkRange, chunkSizeFor, firstFairTag } from "./chunks";
import { braneAntibraneAtOrigin } from "./test-configurations";

describe("chunkSizeFor", () => {
  it("sizes chunks by the engine cost of one point", () => {
    // 2 stacks: 3 sectors x (2 + 1) levels = cost 9.
    expect(chunkSizeFor(braneAntibraneAtOrigin, 1000)).toBe(Math.min(chunkLimits.maxPointsPerChunk, Math.floor(chunkLimits.costPerChunk / 9)));
  });

  it("grows chunks so a sweep never has more than the most chunks", () => {
    const heavy = { stacks: braneAntibraneAtOrigin.stacks, levels: 200 };
    expect(chunkCount(200_000, chunkSizeFor(heavy, 200_000))).toBeLessThanOrEqual(chunkLimits.maxChunks);
  });
});

describe("chunkRange", () => {
  it("covers every point exactly once", () => {
    const total = 1003;
    const size = 95;
    const covered: number[] = [];
    for (let chunk = 0; chunk < chunkCount(total, size); chunk += 1) {
      const { start, end } = chunkRange(chunk, size, total);
      for (let i = start; i < end; i += 1) covered.push(i);
    }
    expect(covered).toEqual(Array.from({ length: total }, (_u, i) => i));
  });

  describe("edge cases", () => {
    it("refuses a chunk past the end", () => {
      expect(() => chunkRange(11, 95, 1000)).toThrow(RangeError);
    });
  });
});

describe("firstFairTag", () => {
  /** Serves waiting chunks smallest tag first, ties by arrival, as the queue does (priority = -tag). */
  function simulate(arrivals: { at: number; account: string; chunks: number }[]): string[] {
    const waiting: { tag: number; account: string; order: number }[] = [];
    const served: string[] = [];
    let order = 0;
    for (let step = 0; waiting.length > 0 || arrivals.some((arrival) => arrival.at >= step); step += 1) {
      for (const arrival of arrivals.filter((a) => a.at === step)) {
        const smallest = waiting.length ? Math.min(...waiting.map((chunk) => chunk.tag)) : null;
        const own = waiting.filter((chunk) => chunk.account === arrival.account).map((chunk) => chunk.tag);
        const first = firstFairTag(smallest, own.length ? Math.max(...own) : null);
        for (let i = 0; i < arrival.chunks; i += 1) waiting.push({ tag: first + i, account: arrival.account, order: order++ });
      }
      waiting.sort((x, y) => x.tag - y.tag || x.order - y.order);
      const next = waiting.shift();
      if (next) served.push(next.account);
    }
    return served;
  }

  it("lets a small sweep started later run beside a big one instead of waiting behind it", () => {
    const served = simulate([
      { at: 0, account: "big", chunks: 100 },
      { at: 10, account: "small", chunks: 5 },
    ]);
    // The small sweep's 5 chunks are done within 10 chunks of its arrival, alternating with the big
    // one (equal tags go in arrival order, so the big sweep's waiting chunk goes first).
    expect(served.slice(10, 20)).toEqual(["big", "small", "big", "small", "big", "small", "big", "small", "big", "small"]);
    expect(served.filter((account) => account === "big")).toHaveLength(100);
  });

  it("queues an account's second sweep behind its first", () => {
    const served = simulate([
      { at: 0, account: "a", chunks: 3 },
      { at: 0, account: "a", chunks: 3 },
      { at: 1, account: "b", chunks: 2 },
    ]);
    // a's chunks carry tags 0..5; b joins at virtual time 1 with tags 1 and 2.
    expect(served).toEqual(["a", "a", "b", "a", "b", "a", "a", "a"]);
  });

  it("starts at 0 on an idle queue", () => {
    expect(firstFairTag(null, null)).toBe(0);
    expect(firstFairTag(500, null)).toBe(500);
    expect(firstFairTag(500, 999)).toBe(1000);
    expect(firstFairTag(500, 100)).toBe(500);
  });
});
