import "server-only";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { organisations } from "@/db/schema";
import { can } from "@/lib/roles";
import type { OrganisationSettingsInput } from "@/lib/validation/auth";
import type { AccessContext } from "./access";
import { AccessDenied } from "./access-denied";

/** How long a new customer link works unless the person making it chooses otherwise (days). */
export async function linkLifetimeDays(access: AccessContext): Promise<number> {
  const db = await getDb();
  const row = await db.select({ days: organisations.linkLifetimeDays }).from(organisations).where(eq(organisations.id, access.organisation.id)).get();
  return row?.days ?? DEFAULT_LINK_LIFETIME_DAYS;
}

export const DEFAULT_LINK_LIFETIME_DAYS = 180;

export async function updateOrganisationSettings(access: AccessContext, input: OrganisationSettingsInput) {
  if (!can(access.role, "organisation.manage")) throw new AccessDenied("organisation.manage");
  const db = await getDb();
  await db
    .update(organisations)
    .set({
      name: input.name,
      units: input.units,
      tightMarginRatio: input.tightMarginPercent / 100,
      frontAxleLossRatio: input.frontAxleLossPercent / 100,
      linkLifetimeDays: input.linkLifetimeDays,
      country: input.country ?? null,
      region: input.country ? (input.region ?? null) : null,
    })
    .where(eq(organisations.id, access.organisation.id));
}
