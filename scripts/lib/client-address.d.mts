// Types of client-address.mjs for the TypeScript code and tests that import it.
import type { IncomingMessage, ServerResponse } from "node:http";

export declare const clientAddressHeader: "x-mooring-client-address";

export declare function parseTrustedProxyCount(value: string | undefined): number;

export interface ResolveClientAddressInput {
  socketAddress: string | undefined;
  forwardedFor: string | string[] | undefined;
  trustedProxyCount: number;
}

export declare function resolveClientAddress(input: ResolveClientAddressInput): string;

export declare function stampClientAddress(req: IncomingMessage, trustedProxyCount: number): string;

export declare function withClientAddress<T>(
  listener: (req: IncomingMessage, res: ServerResponse) => T,
  trustedProxyCount: number,
): (req: IncomingMessage, res: ServerResponse) => T;
