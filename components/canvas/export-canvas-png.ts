/**
 * Saves what the designer's stage shows as a PNG. Konva draws each layer into its own <canvas>
 * inside the stage's container, so the layers are composited in order onto one canvas filled with
 * the page background (layers are transparent) before download. Browser only.
 */
export function exportCanvasPng(container: HTMLElement, fileName: string): boolean {
  const layers = Array.from(container.querySelectorAll("canvas"));
  const first = layers[0];
  if (!first || first.width === 0 || first.height === 0) return false;
  const output = window.document.createElement("canvas");
  output.width = first.width;
  output.height = first.height;
  const context = output.getContext("2d");
  if (!context) return false;
  context.fillStyle = getComputedStyle(container).backgroundColor || "#ffffff";
  context.fillRect(0, 0, output.width, output.height);
  for (const layer of layers) context.drawImage(layer, 0, 0);
  const link = window.document.createElement("a");
  link.href = output.toDataURL("image/png");
  link.download = fileName;
  link.click();
  return true;
}

/**
 * Exports once the canvas has been drawn: the canvas library loads after the page, so an early
 * click waits for it (checking every 100 ms) instead of doing nothing. Resolves to false when
 * there is still no drawn canvas after `timeoutMs`.
 */
export async function exportCanvasPngWhenReady(
  findContainer: () => HTMLElement | null,
  fileName: string,
  timeoutMs = 10_000,
): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const container = findContainer();
    if (container && exportCanvasPng(container, fileName)) return true;
    if (Date.now() >= deadline) return false;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** A file name from a configuration title: lower case, dashes, no punctuation. */
export function pngFileName(title: string): string {
  const slug = title
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "");
  return `${slug || "configuration"}-canvas.png`;
}
