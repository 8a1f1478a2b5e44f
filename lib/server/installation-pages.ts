import "server-only";
import { listFleetProfiles } from "./fleet";
import type { AccessContext } from "./access";
import { listChecklistItems, listInstallers } from "./installations";

/** What the record form needs to offer: the fleet's vehicles, the members, the shop's checklist. */
export async function recordFormOptions(access: AccessContext) {
  const [vehicles, installers, items] = await Promise.all([listFleetProfiles(access, "vehicles"), listInstallers(access), listChecklistItems(access)]);
  return {
    vehicles: vehicles.map(({ id, name }) => ({ id, name })),
    installers: installers.map(({ id, name }) => ({ id, name })),
    checklistItems: items.map(({ id, label, valueLabel }) => ({ id, label, valueLabel })),
  };
}
