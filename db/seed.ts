import { eq } from "drizzle-orm";
import { randomBytes } from "node:crypto";
import { hashPassword } from "../lib/auth/password-hash";
import type { Role } from "../lib/roles";
import { getDb } from "./client";
import { evaluateRig } from "../lib/towing";
import type { RigInput } from "../lib/towing/input";
import { DEMO_ACCESSORIES, DEMO_CHECKS, DEMO_TRAILERS, DEMO_VEHICLES } from "./demo-rigs";
import { seedDemoFleet } from "./demo-fleet";
import { seedDemoInstallations } from "./demo-installations";
import { accessoryProfiles, memberships, organisations, savedChecks, trailerProfiles, users, vehicleProfiles } from "./schema";

/**
 * The demo's invented scenario: Quillfield Hitch & Trailer, a hitch shop, and Fernhollow Grounds, a
 * landscaping fleet that buys its hitches there. Every name and address is made up (example.com).
 */
export const DEMO_PASSWORD = "towmargin-demo";

export const DEMO_ORGANISATIONS = [
  { id: "org-quillfield", name: "Quillfield Hitch & Trailer", kind: "shop", units: "imperial" },
  { id: "org-fernhollow", name: "Fernhollow Grounds", kind: "fleet", units: "imperial" },
] as const;

export const DEMO_PEOPLE: ReadonlyArray<{ email: string; name: string; organisationId: string; role: Role }> = [
  { email: "owner@quillfield.example.com", name: "Ines Harrowgate", organisationId: "org-quillfield", role: "owner" },
  { email: "counter@quillfield.example.com", name: "Rowan Teague", organisationId: "org-quillfield", role: "staff" },
  { email: "counter2@quillfield.example.com", name: "Sami Lindqvell", organisationId: "org-quillfield", role: "staff" },
  { email: "trainer@quillfield.example.com", name: "Beatrix Mollander", organisationId: "org-quillfield", role: "trainer" },
  { email: "fleet@fernhollow.example.com", name: "Caspian Nwokedi", organisationId: "org-fernhollow", role: "fleet_manager" },
];

const newId = () => randomBytes(15).toString("base64url");

/** Adds the demo organisations and people once; running it again changes nothing. */
export async function seedDemo(): Promise<{ created: boolean }> {
  const db = await getDb();
  const existing = await db.select({ id: organisations.id }).from(organisations).where(eq(organisations.id, DEMO_ORGANISATIONS[0].id)).get();
  if (existing) return { created: false };
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const shop = DEMO_ORGANISATIONS[0].id;
  await db.transaction(async (tx) => {
    for (const organisation of DEMO_ORGANISATIONS) await tx.insert(organisations).values({ ...organisation });
    const userIds = new Map<string, string>();
    for (const person of DEMO_PEOPLE) {
      const userId = newId();
      userIds.set(person.email, userId);
      await tx.insert(users).values({ id: userId, email: person.email, name: person.name, passwordHash });
      await tx.insert(memberships).values({ id: newId(), userId, organisationId: person.organisationId, role: person.role });
    }
    const vehicleIds = new Map<string, { id: string; data: Record<string, unknown> }>();
    for (const { name, ...data } of DEMO_VEHICLES) {
      const id = newId();
      vehicleIds.set(name, { id, data: { units: "imperial", ...data } });
      await tx.insert(vehicleProfiles).values({ id, organisationId: shop, name, units: "imperial", data: { units: "imperial", ...data } });
    }
    for (const { name, ...data } of DEMO_TRAILERS) {
      await tx.insert(trailerProfiles).values({ id: newId(), organisationId: shop, name, units: "imperial", data: { units: "imperial", ...data } });
    }
    for (const { name, ...data } of DEMO_ACCESSORIES) {
      await tx.insert(accessoryProfiles).values({ id: newId(), organisationId: shop, name, units: "imperial", data: { units: "imperial", ...data } });
    }
    await seedDemoFleet(tx);
    // A few checks the counter saved over the last days, computed by the core as the app would.
    let daysAgo = DEMO_CHECKS.length;
    for (const check of DEMO_CHECKS) {
      const { name: vehicleName, ...vehicle } = DEMO_VEHICLES[check.vehicle]!;
      const hitched = check.trailer !== undefined ? DEMO_TRAILERS[check.trailer]! : DEMO_ACCESSORIES[check.accessory!]!;
      const { name: hitchedName, ...hitchedPart } = hitched;
      const rig = { units: "imperial", name: vehicleName, ...vehicle, ...hitchedPart } as RigInput;
      const result = evaluateRig(rig, { tightMarginRatio: 0.1 });
      await tx.insert(savedChecks).values({
        id: newId(),
        organisationId: shop,
        createdByUserId: userIds.get("counter@quillfield.example.com") ?? null,
        customerName: check.customer,
        note: check.note ?? null,
        vehicleLabel: vehicleName,
        hitchedLabel: hitchedName,
        level: result.verdict.level,
        complete: result.verdict.complete,
        units: "imperial",
        rig,
        result,
        coreVersion: result.coreVersion,
        createdAt: new Date(Date.now() - daysAgo-- * 86_400_000),
      });
    }
    await (await import("./demo-training")).seedDemoTraining(tx, shop, userIds);
    const crossover = vehicleIds.get("Corvane Tessel crossover");
    if (crossover) await seedDemoInstallations(tx, shop, crossover.id, userIds.get("counter@quillfield.example.com")!, crossover.data);
  });
  return { created: true };
}
