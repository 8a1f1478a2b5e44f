/**
 * The check screen's form values parsed as the core will see them: the rig built from the values (only the
 * chosen hitched item, blank groups left out) and checked by the shared schema, one message per field.
 */
import { zodResolver } from "@hookform/resolvers/zod";
import type { Resolver } from "react-hook-form";
import type { RigInput } from "@/lib/towing";
import { rigInputSchema } from "@/lib/validation/rig";
import { toRigCandidate, type HitchedKind, type RigFormValues } from "./rig-form";

export type Parsed = { ok: true; rig: RigInput } | { ok: false; issues: Array<{ path: string; message: string }> };

export function parseCandidate(values: RigFormValues, kind: HitchedKind): Parsed {
  const parsed = rigInputSchema.safeParse(toRigCandidate(values, kind));
  if (parsed.success) return { ok: true, rig: parsed.data };
  const seen = new Set<string>();
  const issues: Array<{ path: string; message: string }> = [];
  for (const issue of parsed.error.issues) {
    const path = issue.path.map(String).join(".");
    if (seen.has(path)) continue;
    seen.add(path);
    issues.push({ path, message: issue.message });
  }
  return { ok: false, issues };
}

/** The form's resolver over the rig as it will be built (the caller builds the candidate from the values). */
export const resolveCandidate = zodResolver(rigInputSchema) as unknown as Resolver<RigFormValues, unknown, RigInput>;
