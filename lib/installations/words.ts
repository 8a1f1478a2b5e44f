/**
 * The words and lists of installation records, light enough for any page (no core, no zod).
 */
export const INSTALLATION_STATES = ["planned", "fitted", "handed-over"] as const;
export type InstallationState = (typeof INSTALLATION_STATES)[number];
export const STATE_WORDS: Record<InstallationState, string> = { planned: "Planned", fitted: "Fitted", "handed-over": "Handed over" };

export const PHOTO_KINDS = ["hitch-label", "fitted-hitch", "other"] as const;
export const PHOTO_KIND_WORDS: Record<(typeof PHOTO_KINDS)[number], string> = {
  "hitch-label": "Hitch label",
  "fitted-hitch": "Fitted hitch",
  other: "Other",
};

export const MEASUREMENT_KEYS = ["pinToFascia", "receiverHeight", "rearAxleToPin"] as const;
export type MeasurementKey = (typeof MEASUREMENT_KEYS)[number];
export const MEASUREMENT_WORDS: Record<MeasurementKey, { label: string; help: string }> = {
  pinToFascia: { label: "Pin hole to fascia", help: "From the centre of the receiver's pin hole to the outermost point of the bumper cover, level." },
  receiverHeight: { label: "Receiver height", help: "From the ground to the top inside of the receiver opening." },
  rearAxleToPin: { label: "Rear axle centre to pin hole", help: "Level, from the centre of the rear wheel hub to the centre of the receiver's pin hole." },
};
export const DEFAULT_MEASURING_METHOD = "Vehicle unloaded on level ground, tyres at the door-label pressures";

