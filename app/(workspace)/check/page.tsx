import type { Metadata } from "next";
import Link from "next/link";
import { CheckWorkbench } from "@/components/check/check-workbench";
import { PageHeader } from "@/components/ui";
import { can } from "@/lib/roles";
import { requirePage } from "@/lib/server/access";
import { getCheck } from "@/lib/server/checks";
import { rigFromProfiles } from "@/lib/server/fleet";
import { figureSourcesOf } from "@/lib/server/installations";
import { listProfilesForCheck } from "@/lib/server/profiles";
import { entityId } from "@/lib/validation/checks";
import { placeFrom } from "@/lib/towing/rules/places";
import { saveCheckAction, saveVehicleProfileAction } from "./actions";

export const metadata: Metadata = { title: "Check a rig" };

export default async function CheckPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const access = await requirePage("checks.run", "/check");
  const params = await searchParams;
  const from = entityId.safeParse(params.from);
  // "Duplicate" opens a saved check's inputs here; the copy is a new check once saved.
  const source = from.success ? await getCheck(access, from.data) : undefined;
  // A pairing from the fleet opens here with its two profiles filled in (the organisation's own only).
  const pick = (value: unknown) => (entityId.safeParse(value).success ? (value as string) : undefined);
  const pairedIds = { vehicle: pick(params.vehicle), trailer: pick(params.trailer), accessory: pick(params.accessory) };
  const paired = source ? undefined : await rigFromProfiles(access, pairedIds);
  const initialRig = source?.rig ?? paired;
  const profiles = await listProfilesForCheck(access);
  const vehicleId = paired ? pick(params.vehicle) : undefined;
  const sources = vehicleId ? Object.entries(await figureSourcesOf(access, vehicleId)).filter(([, source]) => source.kind === "measured") : [];
  const MEASURED_WORDS: Record<string, string> = { "hitch.receiverHeight": "receiver height", "hitch.pinToFascia": "pin hole to fascia", "vehicle.rearAxleToPin": "rear axle to pin hole" };
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title={source ? "Try a change" : "Check a rig"}
        description={
          source
            ? `Starting from the check saved ${source.createdAt.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" })}${source.customerName ? ` for ${source.customerName}` : ""}. The saved check stays as it was.`
            : paired
              ? `Starting from the fleet's profiles: ${paired.name ?? "vehicle"}. Change any figure to try it; the profiles stay as they are.`
              : "Vehicle, hitch and what is hitched: the verdict follows every figure you type."
        }
      />
      {sources.length ? (
        <p className="text-sm text-ink-soft" data-testid="measured-figures">
          Measured after fitting, from the installation record of {sources[0]![1].fittedOn}:{" "}
          {sources.map(([path]) => MEASURED_WORDS[path] ?? path).join(", ")}.{" "}
          <Link href={`/installations/${sources[0]![1].recordId}`} className="text-accent-strong underline">
            Open the record
          </Link>
        </p>
      ) : null}
      <CheckWorkbench
        key={source?.id ?? (paired ? JSON.stringify([params.vehicle, params.trailer, params.accessory]) : "new")}
        initialRig={initialRig}
        units={initialRig?.units ?? access.organisation.units}
        tightMarginRatio={access.organisation.tightMarginRatio}
        frontAxleLossLimit={access.organisation.frontAxleLossRatio}
        place={source?.result.rules?.place ?? placeFrom(access.organisation.country, access.organisation.region)}
        profiles={profiles}
        initialProfileIds={paired ? pickedProfiles(paired, pairedIds) : undefined}
        onSave={can(access.role, "checks.save") ? saveCheckAction : undefined}
        onSaveVehicleProfile={can(access.role, "profiles.save") ? saveVehicleProfileAction : undefined}
      />
    </div>
  );
}

/** The profiles a pairing's rig was built from, as `rigFromProfiles` takes them: a trailer before an accessory. */
function pickedProfiles(rig: { trailer?: unknown; accessory?: unknown }, ids: { vehicle?: string; trailer?: string; accessory?: string }) {
  return { vehicle: ids.vehicle, trailer: rig.trailer ? ids.trailer : undefined, accessory: rig.trailer ? undefined : rig.accessory ? ids.accessory : undefined };
}
