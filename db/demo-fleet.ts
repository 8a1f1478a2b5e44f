import { randomBytes } from "node:crypto";
import type { RigInput } from "../lib/towing/input";
import type { Database } from "./client";
import { accessoryProfiles, trailerProfiles, vehicleProfiles } from "./schema";

/**
 * Fernhollow Grounds' invented fleet: crew trucks, vans and a yard SUV, the trailers the crews pull and the
 * racks they carry. Every name and figure is made up for the demo (realistic in range, taken from no real
 * vehicle or product). The measurements are "after the hitch was fitted", as a fleet would record them.
 */
type VehiclePart = Pick<RigInput, "vehicle" | "hitch" | "load">;
type TrailerPart = Pick<RigInput, "trailer" | "ballMount" | "weightDistribution">;
type AccessoryPart = Pick<RigInput, "accessory" | "extender">;

const truck = (n: number, tow: number, gvwr: number, curb: number, gcwr: number, hitchClass: 3 | 4 | 5, receiverHeight: number): VehiclePart => ({
  vehicle: {
    towRating: tow, tongueWeightLimit: Math.round(tow / 10), gvwr, curbWeight: curb, gcwr,
    gawrFront: Math.round(gvwr * 0.52 / 10) * 10, gawrRear: Math.round(gvwr * 0.6 / 10) * 10,
    axleWeights: { front: Math.round(curb * 0.56) + 180, rear: Math.round(curb * 0.44) + 420 + n * 10 },
    wheelbase: 140 + n * 2, rearAxleToPin: 40 + (n % 3) * 2, departureAngle: 12,
  },
  hitch: { class: hitchClass, receiverSize: hitchClass === 5 ? "2-1/2" : "2", gtwRating: hitchClass === 5 ? 16000 : hitchClass === 4 ? 10000 : 6000,
    twRating: hitchClass === 5 ? 1600 : hitchClass === 4 ? 1000 : 600, receiverHeight, pinToFascia: 5 },
  load: { occupants: 400, cargo: 350, hitchHardware: 40 },
});

export const FLEET_VEHICLES: Array<{ name: string } & VehiclePart> = [
  { name: "Crew truck 01 · Tallow 2500", ...truck(1, 10000, 9900, 6450, 19000, 4, 20.5) },
  { name: "Crew truck 02 · Tallow 2500", ...truck(2, 10000, 9900, 6500, 19000, 4, 20) },
  { name: "Crew truck 03 · Tallow 1500", ...truck(3, 9000, 7100, 5150, 15000, 4, 20.5) },
  { name: "Crew truck 04 · Tallow 1500", ...truck(4, 9000, 7100, 5200, 15000, 4, 20) },
  { name: "Crew truck 05 · Brackwater 3500 dually", ...truck(5, 14000, 14000, 7900, 26000, 5, 21) },
  { name: "Crew truck 06 · Brackwater 3500 dually", ...truck(6, 14000, 14000, 8000, 26000, 5, 21.5) },
  { name: "Dump truck 07 · Ostler 4500", ...truck(7, 13000, 16500, 9100, 28000, 5, 24) },
  { name: "Foreman pickup 08 · Kestrow midsize", ...truck(8, 6000, 6000, 4400, 10800, 3, 18) },
  {
    name: "Service van 09 · Marlow cargo van",
    vehicle: { towRating: 5000, tongueWeightLimit: 500, gvwr: 9000, curbWeight: 5600, gcwr: 14000, gawrFront: 4000, gawrRear: 5400,
      axleWeights: { front: 3300, rear: 3900 }, wheelbase: 148, rearAxleToPin: 34, departureAngle: 12 },
    hitch: { class: 3, receiverSize: "2", gtwRating: 5000, twRating: 500, receiverHeight: 21, pinToFascia: 4.5 },
    load: { occupants: 350, cargo: 1200, hitchHardware: 30 },
  },
  {
    name: "Service van 10 · Marlow cargo van",
    vehicle: { towRating: 5000, tongueWeightLimit: 500, gvwr: 9000, curbWeight: 5650, gcwr: 14000, gawrFront: 4000, gawrRear: 5400,
      axleWeights: { front: 3320, rear: 4150 }, wheelbase: 148, rearAxleToPin: 34, departureAngle: 12 },
    hitch: { class: 3, receiverSize: "2", gtwRating: 5000, twRating: 500, receiverHeight: 21.5, pinToFascia: 4.5 },
    load: { occupants: 350, cargo: 1500, hitchHardware: 30 },
  },
  {
    name: "Yard SUV 11 · Fenwick Dunmere",
    vehicle: { towRating: 5000, tongueWeightLimit: 500, gvwr: 5900, curbWeight: 4350, gcwr: 10300, gawrFront: 2900, gawrRear: 3250,
      axleWeights: { front: 2500, rear: 2300 }, wheelbase: 114, rearAxleToPin: 33, departureAngle: 22 },
    hitch: { class: 3, receiverSize: "2", gtwRating: 5000, twRating: 500, receiverHeight: 17.5, pinToFascia: 5.5 },
    load: { occupants: 300, cargo: 150, hitchHardware: 25 },
  },
  {
    name: "Estimator car 12 · Corbel crossover",
    vehicle: { towRating: 2000, tongueWeightLimit: 200, gvwr: 4600, curbWeight: 3550, gcwr: 6600, gawrFront: 2400, gawrRear: 2350,
      axleWeights: { front: 2050, rear: 1650 }, wheelbase: 106, rearAxleToPin: 30, departureAngle: 20 },
    hitch: { class: 1, receiverSize: "1-1/4", gtwRating: 2000, twRating: 200, receiverHeight: 14, pinToFascia: 6 },
    load: { occupants: 200, cargo: 60, hitchHardware: 15 },
  },
];

const utility = (gross: number, tongue: number, coupler: number, ball: "2" | "2-5/16", brakes: "none" | "electric"): TrailerPart => ({
  trailer: { type: "utility", grossTrailerWeight: gross, tongueWeight: tongue, tongueWeightBasis: "measured", couplerHeight: 17.5, couplerRating: coupler,
    couplerBallSize: ball, ballSize: ball, ballRating: coupler, brakes, safetyChainRating: coupler },
  ballMount: { gtwRating: ball === "2" ? 7500 : 12000, twRating: ball === "2" ? 750 : 1200, drop: 3, length: 8 },
});

export const FLEET_TRAILERS: Array<{ name: string } & TrailerPart> = [
  { name: "Mower trailer A · 6×12 single axle", ...utility(2900, 350, 3500, "2", "none") },
  { name: "Mower trailer B · 6×12 single axle", ...utility(3000, 380, 3500, "2", "none") },
  { name: "Landscape trailer C · 7×16 tandem", ...utility(6800, 780, 7000, "2-5/16", "electric") },
  { name: "Landscape trailer D · 7×16 tandem", ...utility(7000, 820, 7000, "2-5/16", "electric") },
  { name: "Skid-steer hauler E · 7×18 equipment", ...utility(9800, 1150, 10000, "2-5/16", "electric") },
  { name: "Mulch dump trailer F · 6×10", ...utility(7000, 900, 7000, "2-5/16", "electric") },
  {
    name: "Enclosed crew trailer G · 7×14",
    trailer: { type: "enclosed-cargo", grossTrailerWeight: 5200, tongueWeight: 560, tongueWeightBasis: "measured", couplerHeight: 18, couplerRating: 7000,
      couplerBallSize: "2-5/16", ballSize: "2-5/16", ballRating: 7000, brakes: "electric", safetyChainRating: 7000 },
    ballMount: { gtwRating: 12000, twRating: 1200, drop: 4, length: 9 },
  },
  {
    name: "Water tank trailer H · 500 gal",
    trailer: { type: "other", grossTrailerWeight: 5400, tongueWeight: 520, tongueWeightBasis: "estimated", couplerHeight: 18.5, couplerRating: 7000,
      couplerBallSize: "2-5/16", ballSize: "2-5/16", ballRating: 7000, brakes: "electric", safetyChainRating: 7000 },
    ballMount: { gtwRating: 12000, twRating: 1200, drop: 2, length: 8 },
  },
  {
    name: "Chipper I · towable brush chipper",
    trailer: { type: "other", grossTrailerWeight: 3700, tongueWeight: 420, tongueWeightBasis: "measured", couplerHeight: 19, couplerRating: 5000,
      couplerBallSize: "2", ballSize: "2", ballRating: 5000, brakes: "surge", safetyChainRating: 5000 },
    ballMount: { gtwRating: 7500, twRating: 750, drop: 0, length: 8 },
  },
  {
    name: "Deck-over flatbed J · 8×20",
    trailer: { type: "car-hauler", grossTrailerWeight: 12500, tongueWeight: 1500, tongueWeightBasis: "measured", couplerHeight: 19, couplerRating: 14000,
      couplerBallSize: "2-5/16", ballSize: "2-5/16", ballRating: 14000, brakes: "electric", safetyChainRating: 14000 },
    ballMount: { gtwRating: 16000, twRating: 1600, drop: 2, length: 10 },
  },
];

export const FLEET_ACCESSORIES: Array<{ name: string } & AccessoryPart> = [
  { name: "Tool basket K · 60 in", accessory: { type: "cargo-carrier", weight: 60, loadWeight: 250, loadCenterFromPin: 24, foldClearance: 0, lowestPointBelowShankTop: 3, lowestPointBehindPin: 34, shankRise: 0 } },
  { name: "Tool basket L · 48 in", accessory: { type: "cargo-carrier", weight: 45, loadWeight: 180, loadCenterFromPin: 20, foldClearance: 0, lowestPointBelowShankTop: 3, lowestPointBehindPin: 28, shankRise: 0 } },
  { name: "Blower rack M · platform", accessory: { type: "platform-rack", weight: 50, loadWeight: 120, loadCenterFromPin: 22, foldClearance: 6, lowestPointBelowShankTop: 4, lowestPointBehindPin: 30, shankRise: 0 } },
  { name: "Trimmer rack N · hanging", accessory: { type: "hanging-rack", weight: 35, loadWeight: 90, loadCenterFromPin: 18, foldClearance: 5, lowestPointBelowShankTop: 8, lowestPointBehindPin: 20, shankRise: 0 } },
  { name: "Fuel caddy carrier O", accessory: { type: "cargo-carrier", weight: 55, loadWeight: 400, loadCenterFromPin: 26, foldClearance: 0, lowestPointBelowShankTop: 2, lowestPointBehindPin: 32, shankRise: 0 } },
];

const newId = () => randomBytes(15).toString("base64url");

type Inserter = Pick<Database, "insert">;

/** Adds the fleet's profiles to the organisation (called once, inside the demo seed's transaction). */
export async function seedDemoFleet(tx: Inserter, organisationId = "org-fernhollow"): Promise<void> {
  const units = "imperial" as const;
  for (const { name, ...data } of FLEET_VEHICLES) await tx.insert(vehicleProfiles).values({ id: newId(), organisationId, name, units, data: { units, ...data } });
  for (const { name, ...data } of FLEET_TRAILERS) await tx.insert(trailerProfiles).values({ id: newId(), organisationId, name, units, data: { units, ...data } });
  for (const { name, ...data } of FLEET_ACCESSORIES) await tx.insert(accessoryProfiles).values({ id: newId(), organisationId, name, units, data: { units, ...data } });
}
