import "server-only";
import type { ActionRefusal } from "./access";

/** JSON responses for route handlers: a shape of their own, never a stack trace. */
export function json(body: unknown, status = 200, headers?: HeadersInit): Response {
  return Response.json(body, { status, headers: { "cache-control": "no-store", ...headers } });
}

export function refusal(result: ActionRefusal): Response {
  return json({ error: result.status === 401 ? "unauthenticated" : "forbidden", message: result.message }, result.status);
}

export function badRequest(fieldErrors: Record<string, string[]>, message = "Some fields need attention."): Response {
  return json({ ok: false, error: "invalid_input", message, fieldErrors }, 400);
}
