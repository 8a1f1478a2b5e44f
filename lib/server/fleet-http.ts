import "server-only";
import { isProfileKind, type ProfileKind } from "@/lib/fleet/fields";
import { json } from "./http";

export function notFoundJson(message: string): Response {
  return json({ error: "not_found", message }, 404);
}

/** The kind segment of a fleet URL, or a 404 answer. */
export async function kindParam(params: Promise<{ kind: string }>): Promise<ProfileKind | Response> {
  const { kind } = await params;
  return isProfileKind(kind) ? kind : notFoundJson("Fleet lists are vehicles, trailers and accessories.");
}

/** A CSV download: never cached, never sniffed, saved under a name we choose. */
export function csvResponse(body: string, fileName: string): Response {
  return new Response(`\uFEFF${body}`, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${fileName}"`,
      "x-content-type-options": "nosniff",
      "cache-control": "no-store",
    },
  });
}
