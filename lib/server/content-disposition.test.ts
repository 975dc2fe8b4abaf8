import { describe, expect, it } from "vitest";
import { contentDisposition } from "./content-disposition";

describe("contentDisposition", () => {
  it("quotes a plain ASCII name and repeats it percent-encoded (RFC 6266 section 4.3)", () => {
    expect(contentDisposition("attachment", "spectrum.csv")).toBe(
      "attachment; filename=\"spectrum.csv\"; filename*=UTF-8''spectrum.csv",
    );
  });

  it("replaces non-ASCII, quotes and backslashes in the fallback and encodes the exact name (RFC 5987)", () => {
    expect(contentDisposition("inline", 'plot "α".png')).toBe(
      "inline; filename=\"plot ___.png\"; filename*=UTF-8''plot%20%22%CE%B1%22.png",
    );
  });

  it("encodes the characters encodeURIComponent leaves alone but RFC 5987 attr-char forbids", () => {
    expect(contentDisposition("attachment", "it's (1)*.pdf")).toContain("filename*=UTF-8''it%27s%20%281%29%2A.pdf");
  });
});
