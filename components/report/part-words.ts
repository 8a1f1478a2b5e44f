/**
 * The words for a figure against its limit. Most limits are a most ("on it 520 lb, allowed 600 lb"); a clearance
 * is a room the part needs against the room it has ("needs 7.0 in, has 5.0 in"). Type-only imports from the core.
 */
import type { AnyCheckResult } from "@/lib/towing/types";

export interface FigureWords {
  actual: string;
  limit: string;
}

const MOST: FigureWords = { actual: "On it", limit: "allowed" };
const ROOM: FigureWords = { actual: "Needs", limit: "has" };

/** The words for one part of an accessory's fit, by the part's id. */
export function partWords(partId: string): FigureWords {
  return partId === "fold" ? ROOM : MOST;
}

/** The words for a check's headline figures: a clearance when the fold governs the accessory's fit. */
export function checkFigureWords(check: AnyCheckResult): FigureWords | undefined {
  if (check.id === "accessory-fit" && check.governing?.id === "hitch.pinToFascia") return ROOM;
  return undefined;
}
