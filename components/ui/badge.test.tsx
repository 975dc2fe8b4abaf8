import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { TachyonBadge } from "@/components/collaboration/result-badges";
import { Badge } from "@/components/ui/badge";

/** The class list of the single element a component renders. */
function classesOf(markup: string): string[] {
  const match = /class="([^"]*)"/.exec(markup);
  return match?.[1]?.split(/\s+/) ?? [];
}

describe("Badge", () => {
  it("lets a className override the variant's border colour instead of both landing in the markup", () => {
    const classes = classesOf(renderToStaticMarkup(<Badge variant="danger" className="border-danger">x</Badge>));
    expect(classes).toContain("border-danger");
    expect(classes).not.toContain("border-transparent");
  });

  it("keeps the variant's classes that the override does not touch", () => {
    const classes = classesOf(renderToStaticMarkup(<Badge variant="danger" className="border-dashed">x</Badge>));
    expect(classes).toEqual(expect.arrayContaining(["bg-danger-soft", "text-danger-soft-foreground", "border-transparent", "border-dashed"]));
  });
});

describe("TachyonBadge", () => {
  it("draws a tachyonic row with a dashed danger border", () => {
    const classes = classesOf(renderToStaticMarkup(<TachyonBadge tachyonic />));
    expect(classes).toEqual(expect.arrayContaining(["border", "border-dashed", "border-danger"]));
    expect(classes).not.toContain("border-transparent");
  });

  it("draws a stable row without the danger border", () => {
    const classes = classesOf(renderToStaticMarkup(<TachyonBadge tachyonic={false} />));
    expect(classes).not.toContain("border-danger");
    expect(classes).not.toContain("border-dashed");
  });
});
