import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { getDb } from "@/db/client";
import { accessoryProfiles, trailerProfiles, vehicleProfiles } from "@/db/schema";
import { can } from "@/lib/roles";
import type { RigInput } from "@/lib/towing/input";
import type { AccessContext } from "./access";
import { newId } from "./tokens";
import { AccessDenied } from "./access-denied";

export type VehicleProfileData = Pick<RigInput, "units" | "vehicle" | "hitch" | "load">;
export type TrailerProfileData = Pick<RigInput, "units" | "trailer" | "ballMount" | "weightDistribution">;
export type AccessoryProfileData = Pick<RigInput, "units" | "accessory" | "extender">;

/** The organisation's profiles that are not archived, for the check screen's pickers. */
export async function listProfilesForCheck(access: AccessContext) {
  if (!can(access.role, "fleet.read")) throw new AccessDenied("fleet.read");
  const db = await getDb();
  const organisationId = access.organisation.id;
  const pick = async (table: typeof vehicleProfiles | typeof trailerProfiles | typeof accessoryProfiles) =>
    db
      .select({ id: table.id, name: table.name, rig: table.data })
      .from(table)
      .where(and(eq(table.organisationId, organisationId), isNull(table.archivedAt)))
      .orderBy(asc(table.name));
  const [vehicles, trailers, accessories] = await Promise.all([pick(vehicleProfiles), pick(trailerProfiles), pick(accessoryProfiles)]);
  return {
    vehicles: vehicles as Array<{ id: string; name: string; rig: VehicleProfileData }>,
    trailers: trailers as Array<{ id: string; name: string; rig: TrailerProfileData }>,
    accessories: accessories as Array<{ id: string; name: string; rig: AccessoryProfileData }>,
  };
}

/** Saves the vehicle part of a typed rig (vehicle, its hitch, its usual load) as a profile. */
export async function createVehicleProfile(access: AccessContext, name: string, rig: RigInput): Promise<string> {
  if (!can(access.role, "profiles.save")) throw new AccessDenied("profiles.save");
  const db = await getDb();
  const id = newId();
  const data: VehicleProfileData = { units: rig.units, vehicle: rig.vehicle, hitch: rig.hitch, load: rig.load };
  await db.insert(vehicleProfiles).values({ id, organisationId: access.organisation.id, name, units: rig.units, data });
  return id;
}

/** The name of the organisation's vehicle profile whose figures are exactly this rig's vehicle, if any. */
export async function matchVehicleProfileName(access: AccessContext, rig: RigInput): Promise<string | undefined> {
  if (!can(access.role, "fleet.read")) throw new AccessDenied("fleet.read");
  const db = await getDb();
  const vehicles = (await db
    .select({ name: vehicleProfiles.name, rig: vehicleProfiles.data })
    .from(vehicleProfiles)
    .where(and(eq(vehicleProfiles.organisationId, access.organisation.id), isNull(vehicleProfiles.archivedAt)))
    .orderBy(asc(vehicleProfiles.name))) as Array<{ name: string; rig: VehicleProfileData }>;
  const wanted = JSON.stringify([rig.units, rig.vehicle]);
  return vehicles.find((profile) => JSON.stringify([profile.rig.units, profile.rig.vehicle]) === wanted)?.name;
}
