/**
 * Example rigs for the workbench's "Try an example" menu. Invented figures in realistic ranges, for a demo
 * only: no real vehicle, trailer or part stands behind any of them.
 */
import type { RigInput } from "@/lib/towing";

export interface SampleRig {
  id: string;
  label: string;
  rig: RigInput;
}

export const SAMPLE_RIGS: SampleRig[] = [
  {
    id: "camper-on-pickup",
    label: "Travel camper on a full-size pickup",
    rig: {
      units: "imperial",
      name: "Example: travel camper on a full-size pickup",
      vehicle: {
        towRating: 5000,
        towRatingWd: 9000,
        tongueWeightLimit: 500,
        tongueWeightLimitWd: 900,
        gvwr: 7000,
        curbWeight: 5150,
        gcwr: 14000,
        gawrFront: 3700,
        gawrRear: 4000,
        axleWeights: { front: 3150, rear: 2550 },
        wheelbase: 145,
        rearAxleToPin: 41,
        wdRequiredAbove: 5000,
        departureAngle: 23,
      },
      hitch: {
        class: 4,
        receiverSize: "2",
        gtwRating: 6000,
        twRating: 600,
        gtwRatingWd: 10000,
        twRatingWd: 1000,
        receiverHeight: 21,
        pinToFascia: 5.5,
      },
      trailer: {
        type: "travel",
        grossTrailerWeight: 6100,
        tongueWeight: 780,
        tongueWeightBasis: "measured",
        couplerHeight: 18,
        couplerRating: 10000,
        couplerBallSize: "2-5/16",
        ballSize: "2-5/16",
        ballRating: 10000,
        brakes: "electric",
        safetyChainRating: 7000,
      },
      ballMount: { drop: 3, length: 9 },
      weightDistribution: {
        used: true,
        tongueRating: 1000,
        fenderUnhitched: 39.5,
        fenderHitched: 40.6,
        fenderWithWd: 40,
        restorationTarget: 50,
      },
      load: { occupants: 340, cargo: 160, hitchHardware: 50 },
    },
  },
  {
    id: "bike-rack-on-crossover",
    label: "Two-bike platform rack on a small crossover",
    rig: {
      units: "imperial",
      name: "Example: two-bike platform rack on a small crossover",
      vehicle: {
        tongueWeightLimit: 200,
        gvwr: 4400,
        curbWeight: 3350,
        gawrFront: 2350,
        gawrRear: 2150,
        axleWeights: { front: 2050, rear: 1650 },
        wheelbase: 106,
        rearAxleToPin: 36,
        departureAngle: 22,
      },
      hitch: { class: 2, receiverSize: "1-1/4", gtwRating: 3500, twRating: 350, receiverHeight: 13, pinToFascia: 5 },
      accessory: {
        type: "platform-rack",
        weight: 48,
        loadWeight: 75,
        loadCenterFromPin: 16,
        foldClearance: 4.5,
        lowestPointBelowShankTop: 3.5,
        lowestPointBehindPin: 32,
        shankRise: 0,
      },
      load: { occupants: 320, cargo: 60, hitchHardware: 0 },
    },
  },
  {
    id: "boat-on-suv",
    label: "Small boat on a mid-size SUV (metric)",
    rig: {
      units: "metric",
      name: "Example: small boat on a mid-size SUV",
      vehicle: {
        towRating: 2270,
        tongueWeightLimit: 227,
        gvwr: 2770,
        curbWeight: 2090,
        gcwr: 4990,
        gawrFront: 1400,
        gawrRear: 1500,
        axleWeights: { front: 1180, rear: 1160 },
        wheelbase: 2900,
        rearAxleToPin: 870,
        departureAngle: 21,
      },
      hitch: { class: 3, receiverSize: "2", gtwRating: 2270, twRating: 227, receiverHeight: 500, pinToFascia: 140 },
      trailer: {
        type: "boat",
        grossTrailerWeight: 1650,
        tongueWeight: 150,
        tongueWeightBasis: "estimated",
        couplerHeight: 430,
        couplerRating: 2270,
        couplerBallSize: "2",
        ballSize: "2",
        ballRating: 2270,
        brakes: "surge",
        safetyChainRating: 2300,
      },
      ballMount: { gtwRating: 2270, twRating: 227, drop: 76, length: 230 },
      load: { occupants: 300, cargo: 80, hitchHardware: 8 },
    },
  },
];
