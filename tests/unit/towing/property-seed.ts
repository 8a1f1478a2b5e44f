import fc from "fast-check";

/**
 * One seed for every property run, so `npm test` answers the same every time and a failure can be repeated.
 * PROPERTY_SEED=random searches afresh (with TOWING_PROPERTY_RUNS for a deeper search); PROPERTY_SEED=<n>
 * repeats the run a failure reported (fast-check prints its seed).
 */
export function fixPropertySeed(): void {
  const asked = process.env.PROPERTY_SEED;
  if (asked === "random") return;
  fc.configureGlobal({ ...fc.readConfigureGlobal(), seed: asked ? Number(asked) : 20261203 });
}
