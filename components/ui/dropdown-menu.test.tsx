import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { DropdownMenu, DropdownMenuItem } from "@/components/ui/dropdown-menu";

describe("DropdownMenu", () => {
  const markup = renderToStaticMarkup(
    <DropdownMenu label="Account: Ada" trigger={<span>AD</span>}>
      <DropdownMenuItem href="/dashboard">Dashboard</DropdownMenuItem>
    </DropdownMenu>,
  );

  it("renders the trigger on the server disabled, so a click before hydration is not lost", () => {
    expect(markup).toMatch(/^<button[^>]* disabled=""/);
  });

  it("renders a closed menu button: named, announcing a menu, with no menu in the markup", () => {
    expect(markup).toContain('aria-label="Account: Ada"');
    expect(markup).toContain('aria-haspopup="menu"');
    expect(markup).toContain('aria-expanded="false"');
    expect(markup).not.toContain('role="menu"');
    expect(markup).not.toContain("Dashboard");
  });
});
