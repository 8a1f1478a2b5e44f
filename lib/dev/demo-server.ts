/**
 * How `npm run demo` starts the app: on the loopback address only. The demo's captured-mail page shows
 * reset and invitation links, so it must not be reachable from other machines on the network.
 */
export const DEMO_HOST = "127.0.0.1";

export function demoServerArgs(port: string): string[] {
  return ["next", "start", "-p", port, "-H", DEMO_HOST];
}
