import { describe, expect, it } from "vitest";
import { InvalidJsonError, PayloadTooLargeError, ValidationError } from "@/lib/errors";
import { assertStorableText, readBodyBytes, readJsonBody } from "./request-body";

/** A POST whose body arrives as a stream of `chunks` with no Content-Length (a chunked upload). */
function streamedRequest(chunks: Uint8Array[], onPull?: () => void): Request {
  let next = 0;
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      onPull?.();
      const chunk = chunks[next];
      next += 1;
      if (chunk) controller.enqueue(chunk);
      else controller.close();
    },
  });
  return new Request("http://test.local/api/x", { method: "POST", body, duplex: "half" } as RequestInit);
}

describe("readBodyBytes", () => {
  it("refuses a declared Content-Length over the limit without reading the body", async () => {
    const request = new Request("http://test.local", { method: "POST", body: "x".repeat(20), headers: { "content-length": "20" } });
    await expect(readBodyBytes(request, 10)).rejects.toBeInstanceOf(PayloadTooLargeError);
    expect(request.bodyUsed).toBe(false);
  });

  it("stops reading a chunked body as soon as it crosses the limit", async () => {
    let pulls = 0;
    const kib = new Uint8Array(1024);
    const request = streamedRequest(Array.from({ length: 1000 }, () => kib), () => {
      pulls += 1;
    });
    await expect(readBodyBytes(request, 4 * 1024)).rejects.toBeInstanceOf(PayloadTooLargeError);
    // Five chunks cross 4 KiB; the other 995 are never pulled (a stream may pull one ahead).
    expect(pulls).toBeLessThanOrEqual(6);
  });

  it("joins the chunks of a body within the limit", async () => {
    const bytes = await readBodyBytes(streamedRequest([new Uint8Array([1, 2]), new Uint8Array([3])]), 3);
    expect([...bytes]).toEqual([1, 2, 3]);
  });
});

describe("readJsonBody", () => {
  const post = (body: BodyInit) => new Request("http://test.local", { method: "POST", body });

  it("parses JSON", async () => {
    expect(await readJsonBody(post('{"a":[1,"b"]}'), 100)).toEqual({ a: [1, "b"] });
  });

  it("answers malformed JSON and malformed UTF-8 with invalid_json (400)", async () => {
    await expect(readJsonBody(post("{ nope"), 100)).rejects.toBeInstanceOf(InvalidJsonError);
    await expect(readJsonBody(post(new Uint8Array([0x22, 0xff, 0x22])), 100)).rejects.toMatchObject({ status: 400 });
  });

  it("refuses NUL characters and unpaired surrogates at their JSON paths (422)", async () => {
    const error = await readJsonBody(post('{"title":"a\\u0000b","stacks":[{"id":"\\ud800"}]}'), 200).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ValidationError);
    expect((error as ValidationError).issues.map((issue) => issue.path)).toEqual([["title"], ["stacks", 0, "id"]]);
  });
});

describe("assertStorableText", () => {
  it("accepts paired surrogates (an emoji) and ordinary text", () => {
    expect(() => assertStorableText({ label: "D3 \u{1F6A2}", n: [1, null, true] })).not.toThrow();
  });

  it("refuses a lone low surrogate and a NUL in a key", () => {
    expect(() => assertStorableText(["\udc00"])).toThrow(ValidationError);
    expect(() => assertStorableText({ "a\u0000": 1 })).toThrow(ValidationError);
  });

  it("walks nesting deeper than the call stack allows", () => {
    const deep = JSON.parse(`${"[".repeat(100_000)}"\\u0000"${"]".repeat(100_000)}`) as unknown;
    const error = (() => {
      try {
        assertStorableText(deep);
        return null;
      } catch (caught) {
        return caught as ValidationError;
      }
    })();
    expect(error?.issues[0]?.path).toHaveLength(100_000);
  });
});
