/**
 * Runs once when the server starts. On Node.js it stamps every incoming request with the address of the
 * connection (lib/server/request.ts reads it for rate limits): the framework passes no socket to route
 * handlers or actions, and a forwarding header is only as true as whoever sent it.
 */
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { stampPeerAddress } = await import("./lib/server/peer-address");
    stampPeerAddress();
  }
}
