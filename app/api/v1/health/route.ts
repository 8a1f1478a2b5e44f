import { json } from "@/lib/server/http";

export const dynamic = "force-dynamic";

/** Liveness: answers without touching the database. */
export function GET() {
  return json({ ok: true, service: "towmargin" });
}
