import { authorize } from "@/lib/server/access";
import { notFoundJson } from "@/lib/server/fleet-http";
import { refusal } from "@/lib/server/http";
import { openInstallationPhoto } from "@/lib/server/installations";
import { entityId } from "@/lib/validation/checks";

export const dynamic = "force-dynamic";

/** Streams a record's photo to a member who may read the record, as the type detected at upload. */
export async function GET(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const allowed = await authorize("installations.read");
  if (!allowed.ok) return refusal(allowed);
  const id = entityId.safeParse((await params).id);
  const opened = id.success ? await openInstallationPhoto(allowed.access, id.data) : undefined;
  if (!opened) return notFoundJson("No such photo in this organisation.");
  const { photo, object } = opened;
  const inline = new URL(request.url).searchParams.get("view") === "1";
  const asciiName = photo.fileName.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
  return new Response(object.body, {
    headers: {
      "content-type": photo.contentType,
      "content-length": String(object.size ?? photo.sizeBytes),
      "content-disposition": `${inline ? "inline" : "attachment"}; filename="${asciiName}"; filename*=UTF-8''${encodeURIComponent(photo.fileName)}`,
      "x-content-type-options": "nosniff",
      "cache-control": "private, no-store",
      "content-security-policy": "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; sandbox",
    },
  });
}
