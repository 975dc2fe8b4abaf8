"use client";

import { useSyncExternalStore } from "react";

const subscribe = () => () => {};

/**
 * False during the server render and hydration, true once React runs in the browser. Forms whose
 * submit runs client code (next-auth's signIn) keep their button disabled until then, so an early
 * click is never lost.
 */
export function useHydrated(): boolean {
  return useSyncExternalStore(
    subscribe,
    () => true,
    () => false,
  );
}
