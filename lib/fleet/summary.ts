/**
 * The few figures a fleet list shows per profile, read from the stored parts. Display only: the rounding
 * goes through lib/format.
 */
import type { ProfileKind } from "./fields";
import { getPath } from "./fields";

export interface SummaryColumn {
  id: string;
  header: string;
  path: string;
  measure?: "mass" | "length";
}

export const SUMMARY_COLUMNS: Record<ProfileKind, SummaryColumn[]> = {
  vehicles: [
    { id: "gvwr", header: "GVWR", path: "vehicle.gvwr", measure: "mass" },
    { id: "tow", header: "Tow rating", path: "vehicle.towRating", measure: "mass" },
    { id: "hitchGtw", header: "Hitch GTW", path: "hitch.gtwRating", measure: "mass" },
    { id: "hitchClass", header: "Class", path: "hitch.class" },
    { id: "receiverHeight", header: "Receiver ht", path: "hitch.receiverHeight", measure: "length" },
    { id: "pinToFascia", header: "Pin–fascia", path: "hitch.pinToFascia", measure: "length" },
  ],
  trailers: [
    { id: "type", header: "Type", path: "trailer.type" },
    { id: "gross", header: "Gross weight", path: "trailer.grossTrailerWeight", measure: "mass" },
    { id: "tongue", header: "Tongue weight", path: "trailer.tongueWeight", measure: "mass" },
    { id: "ball", header: "Ball", path: "trailer.ballSize" },
    { id: "brakes", header: "Brakes", path: "trailer.brakes" },
  ],
  accessories: [
    { id: "type", header: "Type", path: "accessory.type" },
    { id: "weight", header: "Own weight", path: "accessory.weight", measure: "mass" },
    { id: "load", header: "Load", path: "accessory.loadWeight", measure: "mass" },
    { id: "centre", header: "Load centre", path: "accessory.loadCenterFromPin", measure: "length" },
  ],
};

export function summaryValue(column: SummaryColumn, data: unknown): string | number | undefined {
  const value = getPath(data, column.path);
  return typeof value === "number" || typeof value === "string" ? value : undefined;
}

export function measureUnit(measure: "mass" | "length" | undefined, units: "imperial" | "metric"): string {
  if (measure === "mass") return units === "metric" ? "kg" : "lb";
  if (measure === "length") return units === "metric" ? "mm" : "in";
  return "";
}
