import "server-only";
import { fileTypeFromBuffer } from "file-type";
import { and, desc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { vehicleDocuments, vehicleProfiles } from "@/db/schema";
import { env } from "@/lib/env";
import { can, type Permission } from "@/lib/roles";
import type { DOCUMENT_KINDS } from "@/lib/validation/fleet";
import type { AccessContext } from "./access";
import { documentStore, type StoredObject } from "./storage";
import { AccessDenied } from "./access-denied";
import { newId } from "./tokens";

function assertCan(access: AccessContext, permission: Permission) {
  if (!can(access.role, permission)) throw new AccessDenied(permission);
}

/** What a label document may be, by its content: photos and PDFs. */
export const DOCUMENT_TYPES: Record<string, string> = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/webp": "webp",
  "image/heic": "heic",
  "application/pdf": "pdf",
};

export type DocumentKind = (typeof DOCUMENT_KINDS)[number];

export interface VehicleDocument {
  id: string;
  kind: DocumentKind;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  createdAt: number;
}

export async function listVehicleDocuments(access: AccessContext, vehicleProfileId: string): Promise<VehicleDocument[]> {
  assertCan(access, "fleet.read");
  const db = await getDb();
  const rows = await db
    .select({
      id: vehicleDocuments.id,
      kind: vehicleDocuments.kind,
      fileName: vehicleDocuments.fileName,
      contentType: vehicleDocuments.contentType,
      sizeBytes: vehicleDocuments.sizeBytes,
      createdAt: vehicleDocuments.createdAt,
    })
    .from(vehicleDocuments)
    .where(and(eq(vehicleDocuments.organisationId, access.organisation.id), eq(vehicleDocuments.vehicleProfileId, vehicleProfileId)))
    .orderBy(desc(vehicleDocuments.createdAt));
  return rows.map((row) => ({ ...row, createdAt: row.createdAt.getTime() }));
}

export type UploadResult = { ok: true; document: VehicleDocument } | { ok: false; status: 400 | 404 | 413; field: string; message: string };

/** A file name safe to show and to send back in Content-Disposition: no path, no control characters. */
export function cleanFileName(name: string, extension: string): string {
  const base = name.split(/[\\/]/).pop() ?? "";
  const cleaned = base.replace(/[\u0000-\u001f\u007f"]/g, "").trim().slice(0, 120);
  return cleaned || `document.${extension}`;
}

/**
 * What every stored document passes: not empty, at most UPLOAD_MAX_BYTES, and a photo or PDF by its bytes
 * (magic numbers), never by its name or the browser's claim. Used for vehicle labels and installation photos.
 */
export async function checkDocumentBytes(file: { bytes: Uint8Array }): Promise<{ ok: true; mime: string; extension: string } | { ok: false; status: 400 | 413; field: string; message: string }> {
  if (file.bytes.byteLength === 0) return { ok: false, status: 400, field: "file", message: "The file is empty." };
  if (file.bytes.byteLength > env.UPLOAD_MAX_BYTES) {
    return { ok: false, status: 413, field: "file", message: `The file is larger than ${Math.round(env.UPLOAD_MAX_BYTES / 1024 / 1024)} MB. Take a smaller photo or scan.` };
  }
  const detected = await fileTypeFromBuffer(file.bytes);
  const extension = detected ? DOCUMENT_TYPES[detected.mime] : undefined;
  if (!detected || !extension) {
    return { ok: false, status: 400, field: "file", message: "Upload a photo (JPEG, PNG, WebP, HEIC) or a PDF. This file is neither, whatever its name says." };
  }
  return { ok: true, mime: detected.mime, extension };
}

/**
 * Stores a label photo or PDF with a vehicle of this organisation. The type comes from the bytes (magic
 * numbers), never from the name or the browser's claim.
 */
export async function uploadVehicleDocument(
  access: AccessContext,
  vehicleProfileId: string,
  kind: DocumentKind,
  file: { name: string; bytes: Uint8Array },
): Promise<UploadResult> {
  assertCan(access, "fleet.edit");
  const db = await getDb();
  const organisationId = access.organisation.id;
  const vehicle = await db
    .select({ id: vehicleProfiles.id })
    .from(vehicleProfiles)
    .where(and(eq(vehicleProfiles.id, vehicleProfileId), eq(vehicleProfiles.organisationId, organisationId)))
    .get();
  if (!vehicle) return { ok: false, status: 404, field: "vehicle", message: "No such vehicle in this organisation." };
  const checked = await checkDocumentBytes(file);
  if (!checked.ok) return checked;
  const { mime, extension } = checked;
  const id = newId();
  const storageKey = `${organisationId.replace(/[^A-Za-z0-9_-]/g, "_")}/${id}.${extension}`;
  await documentStore().put(storageKey, file.bytes, mime);
  const document = {
    id,
    organisationId,
    vehicleProfileId,
    kind,
    fileName: cleanFileName(file.name, extension),
    contentType: mime,
    sizeBytes: file.bytes.byteLength,
    storageKey,
    uploadedByUserId: access.user.id,
  };
  try {
    await db.insert(vehicleDocuments).values(document);
  } catch (error) {
    await documentStore().delete(storageKey);
    throw error;
  }
  return {
    ok: true,
    document: { id, kind, fileName: document.fileName, contentType: document.contentType, sizeBytes: document.sizeBytes, createdAt: Date.now() },
  };
}

/** The document and its bytes, for a member of its organisation; undefined otherwise. */
export async function openVehicleDocument(access: AccessContext, id: string): Promise<{ document: VehicleDocument; object: StoredObject } | undefined> {
  assertCan(access, "fleet.read");
  const db = await getDb();
  const row = await db
    .select()
    .from(vehicleDocuments)
    .where(and(eq(vehicleDocuments.id, id), eq(vehicleDocuments.organisationId, access.organisation.id)))
    .get();
  if (!row) return undefined;
  const object = await documentStore().get(row.storageKey);
  if (!object) return undefined;
  return {
    document: { id: row.id, kind: row.kind, fileName: row.fileName, contentType: row.contentType, sizeBytes: row.sizeBytes, createdAt: row.createdAt.getTime() },
    object,
  };
}

export async function deleteVehicleDocument(access: AccessContext, id: string): Promise<string | undefined> {
  assertCan(access, "fleet.edit");
  const db = await getDb();
  const [row] = await db
    .delete(vehicleDocuments)
    .where(and(eq(vehicleDocuments.id, id), eq(vehicleDocuments.organisationId, access.organisation.id)))
    .returning({ storageKey: vehicleDocuments.storageKey, vehicleProfileId: vehicleDocuments.vehicleProfileId });
  if (!row) return undefined;
  await documentStore().delete(row.storageKey);
  return row.vehicleProfileId;
}
