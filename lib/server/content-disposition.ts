/**
 * A Content-Disposition header value with an ASCII fallback name and the exact UTF-8 name
 * (RFC 6266 section 4.3 with RFC 5987 `filename*`).
 *
 * @example
 * contentDisposition("attachment", "plot α.png")
 * // => 'attachment; filename="plot _.png"; filename*=UTF-8\'\'plot%20%CE%B1.png'
 */
export function contentDisposition(type: "inline" | "attachment", fileName: string): string {
  const fallback = fileName.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
  const encoded = encodeURIComponent(fileName).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
  return `${type}; filename="${fallback}"; filename*=UTF-8''${encoded}`;
}
