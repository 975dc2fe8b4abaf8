import { describe, expect, it } from "vitest";
import { attachmentFileNameFor, extensionFor, sniffContentType } from "./sniff";

const bytes = (...values: number[]) => new Uint8Array(values);
const text = (value: string) => new TextEncoder().encode(value);

describe("sniffContentType", () => {
  it("detects PNG from its 8-byte signature (RFC 2083 section 3.1)", () => {
    expect(sniffContentType(bytes(0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13))).toBe("image/png");
  });

  it("detects JPEG from SOI followed by a marker (ITU T.81 annex B)", () => {
    expect(sniffContentType(bytes(0xff, 0xd8, 0xff, 0xe0, 0, 16))).toBe("image/jpeg");
  });

  it("detects PDF from its header (ISO 32000-1 section 7.5.2)", () => {
    expect(sniffContentType(text("%PDF-1.7\n"))).toBe("application/pdf");
  });

  it("rejects other content, whatever it claims to be", () => {
    expect(sniffContentType(text("<svg xmlns='http://www.w3.org/2000/svg'/>"))).toBeNull();
    expect(sniffContentType(text("GIF89a"))).toBeNull();
    expect(sniffContentType(bytes(0x50, 0x4b, 0x03, 0x04))).toBeNull();
  });

  describe("edge cases", () => {
    it("rejects empty and truncated signatures", () => {
      expect(sniffContentType(new Uint8Array())).toBeNull();
      expect(sniffContentType(bytes(0x89, 0x50, 0x4e, 0x47))).toBeNull();
      expect(sniffContentType(text("%PDF"))).toBeNull();
    });
  });
});

describe("extensionFor", () => {
  it("maps each type to its usual extension", () => {
    expect(extensionFor("image/png")).toBe("png");
    expect(extensionFor("image/jpeg")).toBe("jpg");
    expect(extensionFor("application/pdf")).toBe("pdf");
  });
});

describe("attachmentFileNameFor", () => {
  it("gives the name the extension of the type found in the bytes", () => {
    // An HTML page carrying PNG bytes must not be stored as .html (it would open as a page).
    expect(attachmentFileNameFor("plot.html", "image/png")).toBe("plot.png");
    expect(attachmentFileNameFor("figure.svg.html", "image/png")).toBe("figure.svg.png");
    expect(attachmentFileNameFor("notes", "application/pdf")).toBe("notes.pdf");
    expect(attachmentFileNameFor("scan.png", "image/jpeg")).toBe("scan.jpg");
  });

  it("keeps an extension that already names the type, as typed", () => {
    expect(attachmentFileNameFor("figure.png", "image/png")).toBe("figure.png");
    expect(attachmentFileNameFor("photo.JPEG", "image/jpeg")).toBe("photo.JPEG");
    expect(attachmentFileNameFor("paper.Pdf", "application/pdf")).toBe("paper.Pdf");
  });

  describe("edge cases", () => {
    it("treats a leading dot as part of the name and never leaves a bare extension", () => {
      expect(attachmentFileNameFor(".htaccess", "image/png")).toBe(".htaccess.png");
      expect(attachmentFileNameFor("x.", "image/png")).toBe("x.png");
    });
  });
});
