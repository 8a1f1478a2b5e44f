import { authorize } from "@/lib/server/access";
import { openVehicleDocument } from "@/lib/server/documents";
import { notFoundJson } from "@/lib/server/fleet-http";
import { refusal } from "@/lib/server/http";
import { profileIdSchema } from "@/lib/validation/fleet";

export const dynamic = "force-dynamic";

/** Streams a vehicle's document to a member of its organisation, as the type detected at upload. */
export async function GET(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const allowed = await authorize("fleet.read");
  if (!allowed.ok) return refusal(allowed);
  const id = profileIdSchema.safeParse((await params).id);
  const opened = id.success ? await openVehicleDocument(allowed.access, id.data) : undefined;
  if (!opened) return notFoundJson("No such document in this organisation.");
  const { document, object } = opened;
  const inline = new URL(request.url).searchParams.get("view") === "1";
  const asciiName = document.fileName.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
  return new Response(object.body, {
    headers: {
      "content-type": document.contentType,
      "content-length": String(object.size ?? document.sizeBytes),
      "content-disposition": `${inline ? "inline" : "attachment"}; filename="${asciiName}"; filename*=UTF-8''${encodeURIComponent(document.fileName)}`,
      "x-content-type-options": "nosniff",
      "cache-control": "private, no-store",
      "content-security-policy": "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; sandbox",
    },
  });
}
