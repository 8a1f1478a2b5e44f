import { describe, expect, it } from "vitest";
import { parseRig } from "@/lib/towing";

// Every message a person can read is the product's own sentence, never the validator's default wording.
const BAD_BODIES: unknown[] = [
  undefined,
  null,
  [],
  "a rig",
  42,
  {},
  { units: "imperial" },
  { units: "imperial", hitch: {} },
  { units: "metric", vehicle: 5 },
  { units: "imperial", vehicle: [] },
  { units: "imperial", vehicle: {}, trailer: "x" },
  { units: "imperial", vehicle: {}, trailer: {} },
  { units: "imperial", vehicle: {}, hitch: null },
  { units: "imperial", vehicle: {}, load: true },
  { units: "imperial", vehicle: {}, weightDistribution: {} },
  { units: "imperial", vehicle: {}, extender: {} },
  { units: "imperial", vehicle: { gvwr: "heavy" } },
  { units: "imperial", vehicle: { axleWeights: 3 } },
  { units: "furlongs", vehicle: {} },
];

describe("rig validation speaks the product's words", () => {
  for (const body of BAD_BODIES) {
    it(`refuses ${JSON.stringify(body) ?? "nothing"} in its own sentences`, () => {
      const parsed = parseRig(body);
      expect(parsed.ok).toBe(false);
      if (parsed.ok) return;
      for (const [field, messages] of Object.entries(parsed.fieldErrors)) {
        for (const message of messages) {
          expect(message, field).not.toMatch(/Invalid input|expected |received |Unrecognized/i);
          expect(message.length, field).toBeGreaterThan(10);
        }
      }
    });
  }

  it("names the missing vehicle section and says how to send it", () => {
    const parsed = parseRig({ units: "imperial", hitch: {} });
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.fieldErrors.vehicle).toEqual(["The vehicle section is required: send it with the figures you know, or as {} when none are known yet."]);
  });
});
