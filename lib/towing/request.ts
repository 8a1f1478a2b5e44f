/**
 * The evaluate contract shared by `npm run evaluate` and `POST /api/v1/evaluate`: a bare rig, or
 * `{ rig, options, detail }`. Never throws; field-error keys are dotted paths (docs/evaluate.md).
 */
import { parseRig, type RigInput } from "./input";
import type { EvaluateOptions } from "./types";
import { placeSchema } from "./rules/places";

/** "full" (the default): every check with its worked steps and texts. "summary": verdict and figures only. */
export type EvaluateDetail = "full" | "summary";

export type EvaluateRequest =
  | { ok: true; rig: RigInput; options: EvaluateOptions; detail: EvaluateDetail }
  | { ok: false; fieldErrors: Record<string, string[]> };

export function parseEvaluateRequest(body: unknown): EvaluateRequest {
  const wrapped = body !== null && typeof body === "object" && !Array.isArray(body) && "rig" in body;
  const rawRig = wrapped ? (body as { rig: unknown }).rig : body;
  const rawOptions = wrapped ? (body as { options?: unknown }).options : undefined;
  const options: EvaluateOptions = {};
  let detail: EvaluateDetail = "full";
  if (wrapped) {
    const rawDetail = (body as { detail?: unknown }).detail;
    if (rawDetail !== undefined) {
      if (rawDetail !== "full" && rawDetail !== "summary") return { ok: false, fieldErrors: { detail: ['Choose "full" or "summary".'] } };
      detail = rawDetail;
    }
  }
  if (rawOptions !== undefined) {
    if (rawOptions === null || typeof rawOptions !== "object" || Array.isArray(rawOptions)) {
      return { ok: false, fieldErrors: { options: ["Options must be an object."] } };
    }
    const { tightMarginRatio, accessoryReferenceArm, frontAxleLossLimit, place } = rawOptions as Record<string, unknown>;
    if (place !== undefined) {
      const parsed = parsePlace(place);
      if (!parsed.ok) return { ok: false, fieldErrors: parsed.fieldErrors };
      options.place = parsed.place;
    }
    if (tightMarginRatio !== undefined) {
      if (typeof tightMarginRatio !== "number" || !Number.isFinite(tightMarginRatio) || tightMarginRatio < 0 || tightMarginRatio > 0.5) {
        return { ok: false, fieldErrors: { "options.tightMarginRatio": ["Enter a number from 0 to 0.5."] } };
      }
      options.tightMarginRatio = tightMarginRatio;
    }
    if (frontAxleLossLimit !== undefined) {
      if (typeof frontAxleLossLimit !== "number" || !Number.isFinite(frontAxleLossLimit) || frontAxleLossLimit < 0.01 || frontAxleLossLimit > 0.5) {
        return { ok: false, fieldErrors: { "options.frontAxleLossLimit": ["Enter a number from 0.01 to 0.5."] } };
      }
      options.frontAxleLossLimit = frontAxleLossLimit;
    }
    if (accessoryReferenceArm !== undefined) {
      if (typeof accessoryReferenceArm !== "number" || !Number.isFinite(accessoryReferenceArm) || accessoryReferenceArm <= 0 || accessoryReferenceArm > 2000) {
        return { ok: false, fieldErrors: { "options.accessoryReferenceArm": ["Enter a length above zero."] } };
      }
      options.accessoryReferenceArm = accessoryReferenceArm;
    }
  }
  const parsed = parseRig(rawRig);
  return parsed.ok ? { ok: true, rig: parsed.rig, options, detail } : parsed;
}

/**
 * A place as `{ country, region? }` or as a code "GB-ENG", "US-TX", "EU". Field-error keys start with
 * "options.place".
 */
export function parsePlace(value: unknown): { ok: true; place: NonNullable<EvaluateOptions["place"]> } | { ok: false; fieldErrors: Record<string, string[]> } {
  let candidate = value;
  if (typeof value === "string") {
    const [country, ...rest] = value.trim().toUpperCase().split("-");
    candidate = rest.length ? { country, region: rest.join("-") } : { country };
  }
  if (candidate === null || typeof candidate !== "object" || Array.isArray(candidate))
    return { ok: false, fieldErrors: { "options.place": ["Place: give a country, and a state or province where rules differ (for example GB-ENG, US-TX, EU)."] } };
  const parsed = placeSchema.safeParse(candidate);
  if (parsed.success) return { ok: true, place: parsed.data };
  const fieldErrors: Record<string, string[]> = {};
  for (const issue of parsed.error.issues) {
    const key = ["options.place", ...issue.path.map(String)].join(".");
    (fieldErrors[key] ??= []).push(issue.message);
  }
  return { ok: false, fieldErrors };
}
