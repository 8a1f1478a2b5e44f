/**
 * The built-in library of worked examples: one per check family, set in an invented valley town, Brackenfold,
 * whose people, vehicles and trailers are all made up. Readable by every organisation; authors copy an example
 * into their own lessons and change it there. Each example's key figure is checked against its published source
 * or a physics derivation in tests/unit/training/library.test.ts.
 */
import type { RigInput } from "@/lib/towing/input";
import type { CheckId } from "@/lib/towing/types";

/** The check families a lesson can be about, with the words a trainer uses for them. */
export const LESSON_FAMILIES = [
  { id: "weakest-link", label: "Weakest link" },
  { id: "tongue-share", label: "Tongue-weight share" },
  { id: "tongue-measure", label: "Measuring tongue weight" },
  { id: "payload", label: "Payload" },
  { id: "combined-weight", label: "Combined weight" },
  { id: "axle-loads", label: "Axle loads" },
  { id: "front-axle-loss", label: "Front-axle load loss" },
  { id: "trailer-labels", label: "The trailer's own ratings" },
  { id: "tyres", label: "Tyre load capacity" },
  { id: "weight-distribution", label: "Weight-distribution restoration" },
  { id: "ball-mount", label: "Ball-mount rise or drop" },
  { id: "hardware-fit", label: "Ball, shank, hole and hitch pin" },
  { id: "accessory-fit", label: "Accessory load and clearance" },
  { id: "envelope", label: "What the rig can still take" },
] as const satisfies ReadonlyArray<{ id: CheckId; label: string }>;

export type LessonFamily = (typeof LESSON_FAMILIES)[number]["id"];
export const LESSON_FAMILY_IDS = LESSON_FAMILIES.map((family) => family.id) as [LessonFamily, ...LessonFamily[]];

export function familyLabel(id: string): string {
  return LESSON_FAMILIES.find((family) => family.id === id)?.label ?? id;
}

/** Who sees a lesson, in words. */
export const VISIBILITY_WORDS = { draft: "Draft", organisation: "Published", public: "Published + link" } as const;

export interface LibraryExample {
  /** Stable, URL-safe: /training/library/<slug>. */
  slug: string;
  title: string;
  story: string;
  question: string;
  checkId: LessonFamily;
  rule: string;
  rig: RigInput;
  /** The step whose result is the example's key figure (what the tests check against the world). */
  keyStep: string;
}

export const LIBRARY: readonly LibraryExample[] = [
  {
    slug: "lowest-rating-governs",
    title: "The hitch, not the truck, sets the limit",
    story:
      "Tamsin Oakhollow runs a fencing crew out of Brackenfold. Her pickup's manual says it tows 7,000 lb, so she wants to pull a 4,600 lb utility trailer loaded with posts. The receiver bolted under the truck is a Class 3 hitch; its own label reads 5,000 lb gross trailer weight and 600 lb tongue weight.",
    question: "Which part limits the gross trailer weight, and how much room is left under it?",
    checkId: "weakest-link",
    rule: "Every part between the vehicle and the trailer has its own rating; the lowest one is the limit for the whole rig. A hitch class only sets a ceiling (SAE J684 puts Class 3 at up to 5,000 lb); the hitch's own label gives its rating, which may be lower. A part can be replaced by a stronger one; the vehicle's own ratings cannot be bought past.",
    keyStep: "lowest-gtw-rating",
    rig: {
      units: "imperial",
      name: "Tamsin's crew-cab pickup with the post trailer (invented)",
      vehicle: { towRating: 7000, tongueWeightLimit: 700, gvwr: 6800, curbWeight: 4900 },
      hitch: { class: 3, receiverSize: "2", gtwRating: 5000, twRating: 600 },
      trailer: {
        type: "utility",
        grossTrailerWeight: 4600,
        tongueWeight: 460,
        tongueWeightBasis: "measured",
        ballSize: "2",
        couplerBallSize: "2",
        ballRating: 6000,
        couplerRating: 7000,
        safetyChainRating: 6000,
        brakes: "electric",
      },
      ballMount: { gtwRating: 6000, twRating: 600 },
    },
  },
  {
    slug: "too-light-on-the-tongue",
    title: "A trailer that is too light on the tongue",
    story:
      "Jory Brannock loaded his landscaping trailer with the heavy roller at the very back so the ramp would drop easily. The trailer weighs 3,000 lb loaded; at the scale the tongue reads 270 lb.",
    question: "What share of the trailer's weight is on the tongue, and is it inside the usual band?",
    checkId: "tongue-share",
    rule: "A conventional trailer should carry 10–15 % of its loaded weight on the tongue. Too little invites sway; too much overloads the rear axle and lightens the steering. Move the load forward, then weigh again.",
    keyStep: "tongue-share",
    rig: {
      units: "imperial",
      name: "Jory's half-ton pickup with the roller trailer (invented)",
      vehicle: { towRating: 6500, tongueWeightLimit: 650 },
      hitch: { class: 3, gtwRating: 5000, twRating: 500 },
      trailer: { type: "utility", grossTrailerWeight: 3000, tongueWeight: 270, tongueWeightBasis: "measured" },
    },
  },
  {
    slug: "family-full-of-payload",
    title: "Five seats, a cooler and a camper tongue",
    story:
      "The Velloway family bought a small travel trailer and will tow it with their three-row SUV: five people (750 lb together), 200 lb of luggage with the cooler, a 40 lb ball mount, and 450 lb on the tongue. The door label gives a GVWR of 6,000 lb; the curb weight is 4,650 lb.",
    question: "What is the SUV's payload capacity, and does the family's load fit in it?",
    checkId: "payload",
    rule: "Payload is GVWR minus curb weight (49 CFR 567.4(g)(3)); curb weight is the vehicle empty with a full tank. People, cargo, hitch hardware and the tongue weight all count against it. Weight distribution does not add payload: the answer is a lighter load.",
    keyStep: "payload-capacity",
    rig: {
      units: "imperial",
      name: "The Velloways' three-row SUV with a small camper (invented)",
      vehicle: { towRating: 5000, tongueWeightLimit: 500, gvwr: 6000, curbWeight: 4650 },
      trailer: { type: "travel", grossTrailerWeight: 4100, tongueWeight: 450, tongueWeightBasis: "measured" },
      load: { occupants: 750, cargo: 200, hitchHardware: 40 },
    },
  },
  {
    slug: "count-the-tongue-once",
    title: "Count the tongue weight once",
    story:
      "Perrin Ashdown wants to haul a skid steer on a 7,500 lb equipment trailer with his half-ton pickup (curb weight 5,400 lb). Two people ride (350 lb), 250 lb of tools are in the bed, and the hitch hardware weighs 60 lb. The truck's GCWR is 13,000 lb. (At this trailer weight the truck's maker would also require weight distribution; this example looks only at the combined weight.)",
    question: "What does the whole combination weigh, and is it within the GCWR?",
    checkId: "combined-weight",
    rule: "Combined weight is the loaded tow vehicle plus the whole trailer. The tongue weight is already part of the trailer's weight: adding it again counts it twice. The combination must not exceed the GCWR, which caps everything: people and cargo included. Weight distribution does not raise it: the answer is a lighter trailer or load, or a heavier-rated truck.",
    keyStep: "combined",
    rig: {
      units: "imperial",
      name: "Perrin's half-ton pickup with the equipment trailer (invented)",
      vehicle: { towRating: 9000, tongueWeightLimit: 900, gvwr: 7100, curbWeight: 5400, gcwr: 13000, wdRequiredAbove: 5000 },
      trailer: { type: "car-hauler", grossTrailerWeight: 7500, tongueWeight: 900, tongueWeightBasis: "measured", brakes: "electric" },
      load: { occupants: 350, cargo: 250, hitchHardware: 60 },
    },
  },
  {
    slug: "tongue-load-on-the-axles",
    title: "Where an 800 lb tongue load really goes",
    story:
      "Marit Quenby weighed her pickup axle by axle before hitching: 3,100 lb front, 2,600 lb rear. The ball sits 50 in behind the rear axle, the wheelbase is 145 in, and her travel trailer puts 800 lb on the ball. She tows without weight distribution for now, though for a 6,400 lb trailer her truck's maker would usually require it.",
    question: "How much load does each axle gain or lose when the trailer is hitched?",
    checkId: "axle-loads",
    rule: "A tongue load behind the rear axle acts like a lever over it: the rear axle carries more than the tongue weight and the front axle is lightened, so it steers and brakes with less grip. Rear gain = TW × (WB + OH) ÷ WB; front change = −TW × OH ÷ WB (statics, moments about the axles). Weigh each axle hitched to compare with the GAWRs.",
    keyStep: "rear-change",
    rig: {
      units: "imperial",
      name: "Marit's pickup with a travel trailer (invented)",
      // 41 in to the pin hole + a 9 in ball mount = the ball 50 in behind the rear axle
      vehicle: { gawrFront: 3700, gawrRear: 4000, axleWeights: { front: 3100, rear: 2600 }, wheelbase: 145, rearAxleToPin: 41 },
      trailer: { type: "travel", grossTrailerWeight: 6400, tongueWeight: 800, tongueWeightBasis: "measured" },
      ballMount: { length: 9 },
    },
  },
  {
    slug: "light-on-the-steering",
    title: "How much grip the front wheels lose",
    story:
      "Osric Wendle's short pickup carries 2,700 lb on its front axle, weighed unhitched and loaded. The ball sits 50 in behind the rear axle, the wheelbase is 145 in, and the trailer puts 800 lb on the ball. His shop calls a front axle that loses more than a tenth of its load worth a second look.",
    question: "How much load does the front axle lose, and what share of it is that?",
    checkId: "front-axle-loss",
    rule: "A tongue load behind the rear axle lifts TW × OH ÷ WB off the front axle (statics, moments about the rear axle); weight distribution gives part of it back. The limit the shop sets (10 % unless it chooses another) is common practice with no published source: beyond it the check reads tight, never over. The vehicle maker's own figure wins.",
    keyStep: "front-loss",
    rig: {
      units: "imperial",
      name: "Osric's pickup with a travel trailer (invented)",
      // 41 in to the pin hole + a 9 in ball mount = the ball 50 in behind the rear axle
      vehicle: { axleWeights: { front: 2700, rear: 2600 }, wheelbase: 145, rearAxleToPin: 41 },
      trailer: { type: "travel", grossTrailerWeight: 6400, tongueWeight: 800, tongueWeightBasis: "measured" },
      ballMount: { length: 9 },
    },
  },
  {
    slug: "give-the-front-axle-back",
    title: "Giving the front axle its load back",
    story:
      "Ysolde Farrant's camper squats her van's rear. On level ground, with the camper's wheels chocked, she measured from the ground to the lip of the front wheel opening, straight above the wheel centre: 1030 mm unhitched and 1058 mm hitched with the spring bars released. With the bars set (using the maker's handle, hands clear) it now reads 1046 mm. The van's maker asks for half of the lost front load to be given back.",
    question: "What front fender height should the bars give, and how much of the lost load do they give back now?",
    checkId: "weight-distribution",
    rule: "Adjust the weight distribution, as its maker's instructions say, until the front fender sits at H1 + (H2 − H1) × (1 − target). Restoration = (H2 − H3) ÷ (H2 − H1); the usual target is 50 % (the SAE J2807 method as given in vehicle owner's manuals). Over 100 % unloads the rear. Weight distribution raises no GVWR, GCWR or payload and takes no load off the ball.",
    keyStep: "target-fender-height",
    rig: {
      units: "metric",
      name: "Ysolde's van with a camper (invented)",
      vehicle: { towRating: 3000, towRatingWd: 3500, tongueWeightLimit: 250, tongueWeightLimitWd: 350 },
      hitch: { class: 4, gtwRatingWd: 3500, twRatingWd: 350, gtwRating: 2700, twRating: 270 },
      trailer: { type: "travel", grossTrailerWeight: 2600, tongueWeight: 290, tongueWeightBasis: "measured" },
      weightDistribution: { used: true, tongueRating: 450, fenderUnhitched: 1030, fenderHitched: 1058, fenderWithWd: 1046, restorationTarget: 50 },
    },
  },
  {
    slug: "riding-level",
    title: "A ball mount that rides level",
    story:
      "Hollis Pendry's lifted pickup has the top of its receiver opening 26 in off the ground. His boat trailer's coupler sits 20 in up when the trailer is level. He brought the 4 in drop mount that came with the truck, which leaves the trailer riding nose-up.",
    question: "What drop does the ball mount need, and how far off level does the 4 in mount leave the trailer?",
    checkId: "ball-mount",
    rule: "Drop = height to the top of the receiver opening − height to the bottom of the coupler, with the trailer level (a negative answer is a rise). Too little drop leaves the trailer nose-up, too much nose-down: either shifts load between its axles and brakes unevenly.",
    keyStep: "drop-needed",
    rig: {
      units: "imperial",
      name: "Hollis's lifted pickup with a boat trailer (invented)",
      vehicle: { towRating: 7500, tongueWeightLimit: 750 },
      hitch: { class: 3, receiverHeight: 26, gtwRating: 5000, twRating: 500 },
      trailer: { type: "boat", grossTrailerWeight: 3200, tongueWeight: 300, tongueWeightBasis: "measured", couplerHeight: 20 },
      ballMount: { drop: 4 },
    },
  },
  {
    slug: "rack-that-scrapes",
    title: "A bike rack that scrapes on the ramp",
    story:
      "Wren Calloway fitted a two-bike platform rack to her hatchback's receiver. The rack's lowest point sits 10 in off the ground and 30 in behind the rear axle. The car's departure angle is 21°, and the rack scraped on her steep driveway.",
    question: "At what angle does the rack meet a ramp, and how much more rise would keep the car's departure angle?",
    checkId: "accessory-fit",
    rule: "49 CFR 523.2 defines the departure angle; keeping a hitch-mounted load above that line is common practice. Its lowest point at height h and distance x behind the rear tyre meets a slope of about atan(h ÷ x). More shank rise lifts it, but often lowers the rack maker's rating and can hide the lights or the number plate; a shorter rack is the other way.",
    keyStep: "accessory-angle",
    rig: {
      units: "imperial",
      name: "Wren's hatchback with a platform rack (invented)",
      vehicle: { tongueWeightLimit: 200, gvwr: 4100, curbWeight: 3000, rearAxleToPin: 22, departureAngle: 21 },
      hitch: { class: 1, receiverSize: "1-1/4", gtwRating: 2000, twRating: 200, receiverHeight: 13, pinToFascia: 6 },
      accessory: { type: "platform-rack", weight: 40, loadWeight: 60, loadCenterFromPin: 12, foldClearance: 4, lowestPointBelowShankTop: 3, lowestPointBehindPin: 8, shankRise: 0 },
    },
  },
  {
    slug: "weighing-a-heavy-tongue",
    title: "Weighing a tongue too heavy for the bathroom scale",
    story:
      "Oriel Haskett loaded her enclosed trailer for a house move and needs its tongue weight. A bathroom scale reads reliably only to about 300 lb, so she chocked the trailer's wheels, laid a beam with one end on a wooden block and the other on a short pipe standing on the scale, and zeroed the scale with the pipe and the beam's end resting on it. She lowered the tongue jack onto the beam 1 ft from the block and 2 ft from the scale, cranked until the coupler came off the ball, and read 250 lb. The trailer weighs 6,000 lb loaded.",
    question: "What is the lever ratio of the beam, and what tongue weight does the 250 lb reading stand for?",
    checkId: "tongue-measure",
    rule: "A bathroom scale under the coupler reads the tongue weight directly up to about 300 lb. Above that, a beam on a block and the scale, with the jack between them: TW = reading × (block to scale) ÷ (block to jack), here 3 × 250 = 750 lb (statics, moments about the block). Or weigh the vehicle at a public scale hitched and unhitched: the gain is the tongue weight. Chock the trailer before jacking and weigh with the spring bars released.",
    keyStep: "beam-tongue-weight",
    rig: {
      units: "imperial",
      name: "Oriel's van with an enclosed trailer (invented)",
      vehicle: { towRating: 8000, tongueWeightLimit: 800 },
      hitch: { class: 4, receiverSize: "2", gtwRating: 8000, twRating: 800 },
      trailer: { type: "enclosed-cargo", grossTrailerWeight: 6000, tongueMeasurement: { scaleReading: 250, blockToJack: 12, jackToScale: 24 }, brakes: "electric" },
    },
  },
  {
    slug: "how-heavy-a-trailer",
    title: "How heavy a trailer to shop for",
    story:
      "The Marrowby brothers want a car hauler for their pickup and ask how heavy a trailer it can pull as they drive it. The brochure says it tows 8,000 lb with 800 lb on the tongue; the door label gives a 7,000 lb GVWR and the manual a 13,500 lb GCWR. Loaded with the two of them, their tools and the ball mount, the truck weighed 3,350 lb front and 2,600 lb rear (rear GAWR 4,000 lb); the wheelbase is 145 in, the receiver's pin hole sits 38 in behind the rear axle and the ball mount reaches 10 in further, so the ball sits 48 in behind it. The hitch's label reads 10,000 lb and 1,000 lb.",
    question: "How much trailer weight does the GCWR leave, and how heavy a trailer does the 800 lb tongue limit allow at a typical 12.5 % tongue share?",
    checkId: "envelope",
    rule: "Every limit counts at once: each gross-trailer-weight rating, the GCWR less the loaded vehicle, and for the tongue each rating, the payload left and the rear axle's room. Work the tongue limit at the trailer's own share: 800 lb at 12.5 % allows 6,400 lb, not the 8,000 lb on the brochure. Above about 5,000 lb most makers also require weight distribution, which raises none of these limits.",
    keyStep: "gcwr-room",
    rig: {
      units: "imperial",
      name: "The Marrowbys' pickup, loaded, before choosing a trailer (invented)",
      vehicle: { towRating: 8000, tongueWeightLimit: 800, gvwr: 7000, gcwr: 13500, gawrFront: 3700, gawrRear: 4000, axleWeights: { front: 3350, rear: 2600 }, wheelbase: 145, rearAxleToPin: 38 },
      hitch: { class: 4, receiverSize: "2", gtwRating: 10000, twRating: 1000 },
      // 38 in to the pin hole + a 10 in ball mount = the ball 48 in behind the rear axle; the car hauler is not chosen yet
      ballMount: { length: 10 },
      trailer: { type: "car-hauler" },
    },
  },
  {
    slug: "the-axle-under-the-trailer",
    title: "The trailer's own axle is the limit",
    story:
      "Lorcan Pettifer packed his single-axle enclosed trailer for a market stall: it weighed 3,400 lb at the public scale, 340 lb of it on the tongue. His van tows 5,000 lb and the trailer's plate gives a 3,500 lb GVWR, so he thought he had room. The same plate gives the axle a 3,000 lb rating.",
    question: "How much load do the trailer's wheels carry, and is it within the axle's rating?",
    checkId: "trailer-labels",
    rule: "The trailer's plate has limits of its own, and the vehicle's and the hitch's ratings do not raise them: the loaded trailer must stay within its GVWR, and its axles within their ratings together. Standing hitched, the axles carry the trailer's weight less what rests on the hitch (statics: GTW − TW).",
    keyStep: "trailer-axle-load",
    rig: {
      units: "imperial",
      name: "Lorcan's van with the market trailer (invented)",
      vehicle: { towRating: 5000, tongueWeightLimit: 500 },
      hitch: { class: 3, receiverSize: "2", gtwRating: 5000, twRating: 500 },
      trailer: { type: "enclosed-cargo", grossTrailerWeight: 3400, tongueWeight: 340, tongueWeightBasis: "measured", mam: 3500, axleRating: 3000, axleCount: 1, brakes: "electric" },
    },
  },
  {
    slug: "tyres-below-the-axle",
    title: "Tyres rated below the axle",
    story:
      "Ysolde Marchbank's pickup came back from a tyre shop on a cheaper set: the sidewalls now say 1,600 lb maximum load each. She tows a horse trailer, and at the public scale the truck's rear axle weighed 3,300 lb hitched. The door label still gives a 3,500 lb rear GAWR.",
    question: "What do the two rear tyres carry together, and is the hitched rear axle within it?",
    checkId: "tyres",
    rule: "Each tyre's maximum load is moulded on its sidewall; an axle's tyres together must carry at least its load, whatever the GAWR says. Two tyres to an axle (four with dual wheels): 2 × 1,600 = 3,200 lb, less than the 3,300 lb the rear axle carries. Tyres rated as the vehicle's placard gives, at its pressure, put it right.",
    keyStep: "rear-tyre-capacity",
    rig: {
      units: "imperial",
      name: "Ysolde's pickup with the horse trailer (invented)",
      vehicle: {
        towRating: 7000,
        tongueWeightLimit: 700,
        gawrFront: 3700,
        gawrRear: 3500,
        axleWeights: { front: 2900, rear: 2600 },
        axleWeightsHitched: { front: 2750, rear: 3300 },
        tyreLoadFront: 2000,
        tyreLoadRear: 1600,
      },
      hitch: { class: 3, receiverSize: "2", gtwRating: 5000, twRating: 600 },
      trailer: { type: "horse-livestock", grossTrailerWeight: 4400, brakes: "electric" },
    },
  },
  {
    slug: "a-ball-that-rocks",
    title: "A ball that rocks in its mount",
    story:
      "Quillon Ashdown bought a 2 in ball with a 3/4 in shank for his boat trailer and bolted it to a ball mount whose hole is 1 in across. Tightened, the nut held it, but the ball shifted when he pushed it sideways.",
    question: "How much room is left round the shank in the hole, and what goes in it?",
    checkId: "hardware-fit",
    rule: "The ball's shank must fill the ball mount's hole: a thinner shank rocks and works its nut loose, a thicker one does not go in. A reducer sleeve rated for the trailer fills the gap (its own ratings are then a link), or a ball with a shank the hole's size. The ball itself must be at least the size the trailer's class allows (15 CRR-NY 57.5 Table 1: 2 in from 2,000 lb).",
    keyStep: "shank-gap",
    rig: {
      units: "imperial",
      name: "Quillon's SUV with the boat trailer (invented)",
      vehicle: { towRating: 5000, tongueWeightLimit: 500 },
      hitch: { class: 3, receiverSize: "2", pinDiameter: "5/8", gtwRating: 5000, twRating: 500 },
      trailer: { type: "boat", grossTrailerWeight: 2800, tongueWeight: 250, tongueWeightBasis: "measured", ballSize: "2", couplerBallSize: "2", ballRating: 6000, ballShankSize: "3/4", brakes: "surge" },
      ballMount: { holeSize: "1" },
    },
  },
];

export function libraryExample(slug: string): LibraryExample | undefined {
  return LIBRARY.find((example) => example.slug === slug);
}
