import { describe, expect, it } from "vitest";
import { renderMail } from "@/lib/server/mail";

const template = {
  to: "ada@mooring.test",
  subject: "Your Mooring sign-in link",
  greeting: "Hello Ada <Quayle>,",
  paragraphs: ["First paragraph.", "Second & last."],
  action: { label: "Sign in", url: "http://127.0.0.1:3000/sign-in/link/abc_DEF-123?x=1&y=2" },
  footnote: "Ignore this if it wasn't you.",
};

describe("renderMail", () => {
  it("puts the link on a line of its own in the text body", () => {
    const { text } = renderMail(template);
    expect(text.split("\n")).toContain("http://127.0.0.1:3000/sign-in/link/abc_DEF-123?x=1&y=2");
    expect(text.startsWith("Hello Ada <Quayle>,\n")).toBe(true);
  });

  it("escapes HTML in every user-supplied part, including the link", () => {
    const { html } = renderMail(template);
    expect(html).toContain("Hello Ada &lt;Quayle&gt;,");
    expect(html).toContain("Second &amp; last.");
    expect(html).toContain('href="http://127.0.0.1:3000/sign-in/link/abc_DEF-123?x=1&amp;y=2"');
    expect(html).toContain("Ignore this if it wasn&#39;t you.");
    expect(html).not.toContain("<Quayle>");
  });

  it("keeps recipient and subject as given", () => {
    const { to, subject } = renderMail(template);
    expect(to).toBe("ada@mooring.test");
    expect(subject).toBe("Your Mooring sign-in link");
  });
});
