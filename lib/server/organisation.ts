import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { organisations } from "@/db/schema";
import { can } from "@/lib/roles";
import type { OrganisationSettingsInput } from "@/lib/validation/auth";
import type { AccessContext } from "./access";
import { AccessDenied } from "./team";

export async function updateOrganisationSettings(access: AccessContext, input: OrganisationSettingsInput) {
  if (!can(access.role, "organisation.manage")) throw new AccessDenied("organisation.manage");
  const db = await getDb();
  await db
    .update(organisations)
    .set({ name: input.name, units: input.units, tightMarginRatio: input.tightMarginPercent / 100 })
    .where(eq(organisations.id, access.organisation.id));
}
