import type { Jsonified } from "@/lib/queries/configurations";

/**
 * A server DTO as the browser would receive it from the API (dates become ISO strings), for
 * seeding react-query caches from a server component without a second shape.
 *
 * @example
 * toJson({ at: new Date(0) }) // => { at: "1970-01-01T00:00:00.000Z" }
 */
export function toJson<T>(value: T): Jsonified<T> {
  return JSON.parse(JSON.stringify(value)) as Jsonified<T>;
}
