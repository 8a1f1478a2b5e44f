"use server";
import { revalidatePath } from "next/cache";
import { authorize } from "@/lib/server/access";
import { updateOrganisationSettings } from "@/lib/server/organisation";
import { organisationSettingsSchema } from "@/lib/validation/auth";
import { invalid, type FormState } from "@/lib/validation/form-state";

export async function saveSettings(_previous: FormState, formData: FormData): Promise<FormState> {
  const allowed = await authorize("organisation.manage");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = organisationSettingsSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  await updateOrganisationSettings(allowed.access, parsed.data);
  revalidatePath("/", "layout");
  return { ok: true, message: "Settings saved." };
}
