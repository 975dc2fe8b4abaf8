import { describe, expect, it } from "vitest";
import { cn } from "@/lib/utils";

describe("cn", () => {
  it("drops falsy parts", () => {
    expect(cn("a", false, null, undefined, "", "b")).toBe("a b");
  });

  it("lets a later utility of the same kind replace an earlier one", () => {
    expect(cn("border border-transparent", "border-danger")).toBe("border border-danger");
    expect(cn("px-2 py-1", "px-4")).toBe("py-1 px-4");
    expect(cn("text-xs text-foreground", "text-danger-soft-foreground")).toBe("text-xs text-danger-soft-foreground");
  });

  it("keeps utilities of different kinds that share a prefix", () => {
    // border width, style and colour are three properties; text size and colour are two.
    expect(cn("border", "border-dashed", "border-danger")).toBe("border border-dashed border-danger");
    expect(cn("text-sm", "text-muted-foreground")).toBe("text-sm text-muted-foreground");
  });

  it("reads the theme's shadow sizes as sizes", () => {
    expect(cn("shadow-panel", "shadow-overlay")).toBe("shadow-overlay");
    expect(cn("shadow-sm", "shadow-panel")).toBe("shadow-panel");
  });

  it("merges per variant", () => {
    expect(cn("hover:bg-surface-muted bg-surface", "hover:bg-accent-soft")).toBe("bg-surface hover:bg-accent-soft");
  });
});
