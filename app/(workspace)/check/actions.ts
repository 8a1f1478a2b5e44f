"use server";
import { revalidatePath } from "next/cache";
import { authorize } from "@/lib/server/access";
import { saveCheck } from "@/lib/server/checks";
import { createVehicleProfile } from "@/lib/server/profiles";
import { saveCheckSchema, vehicleProfileSchema } from "@/lib/validation/checks";
import { invalid, type FormState } from "@/lib/validation/form-state";

export type SaveCheckState = FormState & { checkId?: string };

/** Called by the check screen with the rig as typed; the server evaluates it again before storing. */
export async function saveCheckAction(input: unknown): Promise<SaveCheckState> {
  const allowed = await authorize("checks.save");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = saveCheckSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error.issues);
  const { id } = await saveCheck(allowed.access, parsed.data);
  revalidatePath("/checks");
  return { ok: true, checkId: id, message: "Check saved." };
}

export async function saveVehicleProfileAction(input: unknown): Promise<FormState> {
  const allowed = await authorize("profiles.save");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = vehicleProfileSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error.issues);
  await createVehicleProfile(allowed.access, parsed.data.name, parsed.data.rig);
  revalidatePath("/check");
  return { ok: true, message: `Saved “${parsed.data.name}” as a vehicle profile.` };
}
