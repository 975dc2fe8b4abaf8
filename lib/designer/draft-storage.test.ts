import { describe, expect, it } from "vitest";
import type { Configuration } from "@/lib/boundary/types";
import { clearDraft, draftKey, readDraft, writeDraft, type DraftStorage } from "./draft-storage";

function memoryStorage(): DraftStorage & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return {
    data,
    getItem: (k) => data.get(k) ?? null,
    setItem: (k, v) => void data.set(k, v),
    removeItem: (k) => void data.delete(k),
  };
}

const document: Configuration = { format: 1, title: "t", theory: "IIB", stringScaleGeV: null, levels: 2, stacks: [] };

describe("writeDraft and readDraft", () => {
  it("round-trip a draft under the configuration's key", () => {
    const storage = memoryStorage();
    expect(writeDraft(storage, "abc", { document, baseVersion: 3, savedAt: 10 })).toBe(true);
    expect(storage.data.has(draftKey("abc"))).toBe(true);
    expect(readDraft(storage, "abc")).toEqual({ document, baseVersion: 3, savedAt: 10 });
  });

  it("clearDraft forgets it", () => {
    const storage = memoryStorage();
    writeDraft(storage, "abc", { document, baseVersion: null, savedAt: 1 });
    clearDraft(storage, "abc");
    expect(readDraft(storage, "abc")).toBeNull();
  });

  describe("edge cases", () => {
    it("returns null for garbage", () => {
      const storage = memoryStorage();
      storage.setItem(draftKey("x"), "{not json");
      expect(readDraft(storage, "x")).toBeNull();
      storage.setItem(draftKey("x"), JSON.stringify({ document: { format: 2 }, baseVersion: 1, savedAt: 1 }));
      expect(readDraft(storage, "x")).toBeNull();
    });

    it("reports a storage that throws (quota exceeded) as false instead of throwing", () => {
      const storage: DraftStorage = {
        getItem: () => {
          throw new Error("denied");
        },
        setItem: () => {
          throw new Error("quota");
        },
        removeItem: () => {
          throw new Error("denied");
        },
      };
      expect(writeDraft(storage, "a", { document, baseVersion: 1, savedAt: 1 })).toBe(false);
      expect(readDraft(storage, "a")).toBeNull();
      expect(() => clearDraft(storage, "a")).not.toThrow();
    });
  });
});
