import http from "node:http";

/** Kept in step with PEER_ADDRESS_HEADER in lib/server/request.ts (this file loads before the app). */
const PEER_ADDRESS_HEADER = "x-towmargin-peer";
const STAMPED = Symbol.for("towmargin.peer-address");

/**
 * Writes the connection's address into every request's headers before the framework sees it, over any
 * value the client sent under the same name.
 */
export function stampPeerAddress() {
  const proto = http.Server.prototype as http.Server & { [STAMPED]?: true };
  if (proto[STAMPED]) return;
  proto[STAMPED] = true;
  const emit = proto.emit as (this: http.Server, event: string | symbol, ...args: unknown[]) => boolean;
  proto.emit = function (this: http.Server, event: string | symbol, ...args: unknown[]) {
    if (event === "request") {
      const request = args[0] as http.IncomingMessage;
      request.headers[PEER_ADDRESS_HEADER] = request.socket?.remoteAddress ?? "unknown";
    }
    return emit.apply(this, [event, ...args]);
  } as typeof proto.emit;
}
