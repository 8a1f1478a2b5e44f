import type { RigInput } from "../lib/towing/input";

/**
 * The demo shop's profiles and saved checks. Every make, model and figure is invented for the demo (realistic
 * in range, not taken from any real vehicle or product).
 */
type VehiclePart = Pick<RigInput, "vehicle" | "hitch" | "load">;
type TrailerPart = Pick<RigInput, "trailer" | "ballMount" | "weightDistribution">;
type AccessoryPart = Pick<RigInput, "accessory" | "extender">;

export const DEMO_VEHICLES: Array<{ name: string } & VehiclePart> = [
  {
    name: "Harrow Rookfield 2500 pickup",
    vehicle: {
      towRating: 5000, towRatingWd: 9000, tongueWeightLimit: 500, tongueWeightLimitWd: 900, gvwr: 7000, curbWeight: 5100,
      gcwr: 14000, gawrFront: 3700, gawrRear: 4000, axleWeights: { front: 3150, rear: 2500 }, wheelbase: 145, rearAxleToPin: 41, wdRequiredAbove: 5000, departureAngle: 24,
      towRatingUnbraked: 1650, tyreLoadFront: 2400, tyreLoadRear: 2600,
    },
    hitch: { class: 4, receiverSize: "2", pinDiameter: "5/8", gtwRating: 6000, twRating: 600, gtwRatingWd: 10000, twRatingWd: 1000, receiverHeight: 21, pinToFascia: 5.5 },
    load: { occupants: 350, cargo: 150, hitchHardware: 50 },
  },
  {
    name: "Stellmark Wendle SUV",
    vehicle: {
      towRating: 6500, towRatingWd: 6500, tongueWeightLimit: 650, gvwr: 6400, curbWeight: 4800, gcwr: 11500,
      gawrFront: 3200, gawrRear: 3500, axleWeights: { front: 2750, rear: 2525 }, wheelbase: 120, rearAxleToPin: 37, departureAngle: 22,
      towRatingUnbraked: 2000, tyreLoadFront: 1900, tyreLoadRear: 2000,
    },
    hitch: { class: 3, receiverSize: "2", pinDiameter: "5/8", gtwRating: 5000, twRating: 500, gtwRatingWd: 6500, twRatingWd: 650, receiverHeight: 19, pinToFascia: 4 },
    load: { occupants: 320, cargo: 120, hitchHardware: 35 },
  },
  {
    name: "Corvane Tessel crossover",
    vehicle: {
      towRating: 3500, tongueWeightLimit: 350, gvwr: 5200, curbWeight: 3900, gcwr: 8000, gawrFront: 2700, gawrRear: 2750,
      axleWeights: { front: 2400, rear: 1925 }, wheelbase: 110, rearAxleToPin: 32, departureAngle: 21,
      towRatingUnbraked: 2500, tyreLoadFront: 1600, tyreLoadRear: 1600,
    },
    hitch: { class: 2, receiverSize: "2", pinDiameter: "5/8", gtwRating: 3500, twRating: 350, receiverHeight: 14, pinToFascia: 5.5 },
    load: { occupants: 300, cargo: 100, hitchHardware: 25 },
  },
];

export const DEMO_TRAILERS: Array<{ name: string } & TrailerPart> = [
  {
    name: "Bramblecote 24 travel trailer",
    trailer: {
      type: "travel", grossTrailerWeight: 6200, tongueWeight: 800, tongueWeightBasis: "measured", couplerHeight: 18, couplerRating: 10000,
      couplerBallSize: "2-5/16", ballSize: "2-5/16", ballRating: 10000, ballShankSize: "1-1/4", brakes: "electric", safetyChainRating: 7000,
      mam: 7500, axleRating: 3500, axleCount: 2, tyreLoad: 2150,
    },
    ballMount: { gtwRating: 10000, twRating: 1000, drop: 3, length: 9, holeSize: "1-1/4" },
    weightDistribution: { used: true, tongueRating: 1000, fenderUnhitched: 39.5, fenderHitched: 40.6, fenderWithWd: 40.0, restorationTarget: 50 },
  },
  {
    name: "Fenmoor 17 runabout on its trailer",
    trailer: {
      type: "boat", grossTrailerWeight: 3300, tongueWeight: 300, tongueWeightBasis: "measured", couplerHeight: 16, couplerRating: 5000,
      couplerBallSize: "2", ballSize: "2", ballRating: 5000, ballShankSize: "1", brakes: "surge", safetyChainRating: 5000,
      mam: 3800, axleRating: 3500, axleCount: 1, tyreLoad: 1800,
    },
    ballMount: { gtwRating: 5000, twRating: 500, drop: 2, length: 8, holeSize: "1" },
  },
  {
    name: "Ploughwright 6×10 utility trailer",
    trailer: {
      type: "utility", grossTrailerWeight: 2200, tongueWeight: 260, tongueWeightBasis: "estimated", couplerHeight: 17, couplerRating: 3500,
      couplerBallSize: "2", ballSize: "2", ballRating: 3500, ballShankSize: "1", brakes: "none", safetyChainRating: 3500,
      mam: 2990, axleRating: 3000, axleCount: 1, tyreLoad: 1500,
    },
    ballMount: { gtwRating: 5000, twRating: 500, drop: 0, length: 8, holeSize: "1" },
  },
];

export const DEMO_ACCESSORIES: Array<{ name: string } & AccessoryPart> = [
  {
    name: "Wayfell two-bike platform rack",
    accessory: { type: "platform-rack", weight: 52, loadWeight: 80, loadCenterFromPin: 20, foldClearance: 6.5, lowestPointBelowShankTop: 4, lowestPointBehindPin: 30, shankRise: 0 },
  },
  {
    name: "Tessmore 60 in cargo carrier",
    accessory: { type: "cargo-carrier", weight: 60, loadWeight: 300, loadCenterFromPin: 24, foldClearance: 0, lowestPointBelowShankTop: 3, lowestPointBehindPin: 36, shankRise: 0 },
  },
];

/** Checks the counter saved in the demo: [vehicle, trailer or accessory, customer]. */
export const DEMO_CHECKS: Array<{ vehicle: number; trailer?: number; accessory?: number; customer: string; note?: string }> = [
  { vehicle: 0, trailer: 0, customer: "Perpetua Lindgard", note: "Weighed at the public scale on Harbour Road." },
  { vehicle: 1, trailer: 1, customer: "Oswin Trelawny-Bayes" },
  { vehicle: 2, accessory: 1, customer: "Marisol Quenneville", note: "Asked about a raised shank." },
  { vehicle: 2, trailer: 2, customer: "Tobias Ferncastle" },
];
