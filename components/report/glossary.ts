/**
 * Plain words for the customer's page: what each check means to someone who has never read a towing label.
 * Type-only import from the core; this file must not pull the core into the page's bundle.
 */
import type { CheckId } from "@/lib/towing/types";

export interface CheckWords {
  /** A short title a customer understands. */
  title: string;
  /** One line on what the check looks at. */
  line: string;
}

export const CHECK_WORDS: Record<CheckId, CheckWords> = {
  "weakest-link": {
    title: "Every part's rating",
    line: "Each part between the vehicle and the trailer has its own limit; the lowest one counts for the whole rig.",
  },
  "tongue-share": {
    title: "Weight on the hitch ball",
    line: "How much of the trailer's weight presses down on the hitch: too little lets it sway, too much overloads the back of the vehicle.",
  },
  "tongue-measure": {
    title: "How the tongue weight was found",
    line: "Whether the weight pressing down on the hitch was weighed or estimated.",
  },
  payload: {
    title: "What the vehicle can carry",
    line: "How much the vehicle itself can carry, people and luggage included.",
  },
  "combined-weight": {
    title: "Vehicle and trailer together",
    line: "The most the loaded vehicle and the loaded trailer may weigh added together.",
  },
  "axle-loads": {
    title: "Weight on each axle",
    line: "How much the front and the rear wheels each carry once hitched, against what each axle is rated for.",
  },
  "weight-distribution": {
    title: "Spreading the load",
    line: "Whether a weight-distribution hitch is needed, and how well it brings weight back onto the front wheels.",
  },
  "ball-mount": {
    title: "Riding level",
    line: "Whether the hitch ball sits at the right height for the trailer to ride level.",
  },
  "accessory-fit": {
    title: "Rack or carrier fit",
    line: "Whether the rack or carrier, with its load, suits the hitch, folds clear of the bumper and clears the ground.",
  },
  envelope: {
    title: "How big a trailer fits",
    line: "The heaviest trailer, and the most weight on its tongue, this vehicle could take as it is loaded today.",
  },
};

/** The plain title of a check, for lists such as "these checks still lack figures". */
export function plainTitle(id: CheckId): string {
  return CHECK_WORDS[id]?.title ?? id;
}
