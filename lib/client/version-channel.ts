/**
 * Tells the other tabs of this browser that a configuration was saved, so a designer open on the
 * same configuration elsewhere learns of the newer version at once (it also polls the server, which
 * covers other browsers and people). BroadcastChannel never echoes to the tab that posts.
 */

/** What a tab announces after a successful save. */
export interface SavedVersionMessage {
  type: "saved";
  configurationId: string;
  version: number;
}

const channelName = "mooring:configuration-versions";

function openChannel(): BroadcastChannel | null {
  return typeof BroadcastChannel === "undefined" ? null : new BroadcastChannel(channelName);
}

/** Announces a saved version to the other tabs. */
export function announceSavedVersion(configurationId: string, version: number): void {
  const channel = openChannel();
  if (!channel) return;
  channel.postMessage({ type: "saved", configurationId, version } satisfies SavedVersionMessage);
  channel.close();
}

/** Calls `listener` for every save announced by another tab; returns the unsubscribe function. */
export function subscribeToSavedVersions(listener: (message: SavedVersionMessage) => void): () => void {
  const channel = openChannel();
  if (!channel) return () => {};
  channel.onmessage = (event: MessageEvent<unknown>) => {
    const data = event.data as Partial<SavedVersionMessage> | null;
    if (data?.type === "saved" && typeof data.configurationId === "string" && typeof data.version === "number") {
      listener({ type: "saved", configurationId: data.configurationId, version: data.version });
    }
  };
  return () => channel.close();
}
