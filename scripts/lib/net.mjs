// Loopback port checks for the project's local services.
import net from "node:net";

/** True when something accepts TCP connections on 127.0.0.1:port. */
export function isPortInUse(port) {
  return new Promise((resolve) => {
    const socket = net.connect({ host: "127.0.0.1", port });
    socket.setTimeout(1000);
    socket.once("connect", () => {
      socket.destroy();
      resolve(true);
    });
    socket.once("timeout", () => {
      socket.destroy();
      resolve(false);
    });
    socket.once("error", () => resolve(false));
  });
}

/** First port at or after `from` on which nothing listens on 127.0.0.1 (checks 100 ports). */
export async function findFreePort(from) {
  for (let port = from; port < from + 100; port += 1) {
    if (!(await isPortInUse(port))) return port;
  }
  throw new Error(`no free port found in ${from}..${from + 99}`);
}

/** `preferred` when it is free, otherwise the next free port after it. */
export async function freePortNear(preferred) {
  return (await isPortInUse(preferred)) ? findFreePort(preferred + 1) : preferred;
}
