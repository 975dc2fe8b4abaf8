"use client";

import { useState } from "react";

/**
 * True from the first render in which `open` is true, and ever after: a dialog whose code is
 * loaded on demand (next/dynamic) is mounted when it first opens and then stays mounted, so it
 * closes, returns focus and reopens as an always-mounted one does, while its code stays out of the
 * page's first load.
 */
export function useOpenedOnce(open: boolean): boolean {
  const [opened, setOpened] = useState(open);
  if (open && !opened) setOpened(true);
  return opened || open;
}
