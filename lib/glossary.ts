/**
 * The one source of Towmargin's definitions: the trade's words and the symbols of the worked steps, each in
 * one plain sentence, and the plain words for each check and each status.
 *
 * Pure data with no imports but types, so the check screen, the lessons and the customer's page (which must
 * not pull the calculation core into its bundle) all read the same definitions.
 * tests/unit/glossary.test.ts fails on a term used in a label or a step symbol without an entry here.
 */
import type { CheckId } from "./towing/types";

export interface GlossaryTerm {
  /** Stable, URL-safe: the anchor is `term-<id>`. */
  id: string;
  /** The term as a heading, with its abbreviation where the trade uses one. */
  term: string;
  /** The forms the term takes in labels and sentences (case-insensitive, whole words). */
  names: string[];
  /** One plain sentence. */
  definition: string;
}

export const TERMS = [
  {
    id: "gross-trailer-weight",
    term: "Gross trailer weight (GTW)",
    names: ["gross trailer weight", "GTW", "trailer's weight", "loaded trailer"],
    definition: "What the loaded trailer weighs on its own, with everything aboard; the tongue weight is part of it.",
  },
  {
    id: "tongue-weight",
    term: "Tongue weight (TW)",
    names: ["tongue weight", "TW", "tongue load"],
    definition: "The share of the trailer's weight that presses down on the hitch ball, with the trailer loaded and level.",
  },
  {
    id: "tongue-share",
    term: "Tongue-weight share",
    names: ["tongue-weight share", "tongue share", "lowest share", "highest share", "band"],
    definition:
      "The tongue weight as a percentage of the gross trailer weight; it has to sit inside a band (often 10–15 %): too little invites sway, too much loads the vehicle's rear axle.",
  },
  {
    id: "weight-carrying",
    term: "Weight-carrying",
    names: ["weight-carrying", "weight carrying", "without weight distribution"],
    definition: "Towing with the whole tongue weight resting on the ball and the vehicle's rear axle, with no spring bars; the lower line of ratings on a label.",
  },
  {
    id: "weight-distribution",
    term: "Weight distribution (WD)",
    names: ["weight distribution", "weight-distribution", "weight-distributing", "WD"],
    definition:
      "A hitch head with spring bars that, tensioned, hand part of the tongue's load forward to the vehicle's front axle and back to the trailer's axles; it raises no GVWR, GCWR or payload and takes no load off the ball.",
  },
  {
    id: "spring-bars",
    term: "Spring bars",
    names: ["spring bars"],
    definition:
      "The two steel bars of a weight-distribution hitch; they store a great deal of force under tension, so set them with the maker's handle and keep hands and feet clear.",
  },
  {
    id: "restoration",
    term: "Front axle load restoration",
    names: ["restoration", "restored", "gives back", "FALR"],
    definition:
      "How much of the load the tongue lifts off the front axle the weight distribution gives back, as a percentage; read from three front fender heights.",
  },
  {
    id: "fender-height",
    term: "Front fender height (H1, H2, H3)",
    names: ["fender height", "front fender", "H1", "H2", "H3"],
    definition:
      "Ground to the lip of the front wheel opening, straight above the wheel centre, on level ground: H1 unhitched, H2 hitched with the bars released, H3 hitched with the bars set.",
  },
  {
    id: "gvwr",
    term: "GVWR (gross vehicle weight rating)",
    names: ["GVWR", "gross vehicle weight rating", "GVW"],
    definition:
      "The most the vehicle may weigh loaded: itself, everyone aboard, cargo, the hitch parts and the tongue weight; printed on the door-jamb label.",
  },
  {
    id: "gawr",
    term: "GAWR (gross axle weight rating)",
    names: ["GAWR", "gross axle weight rating", "axle rating"],
    definition: "The most one axle, front or rear, may carry; printed on the door-jamb label.",
  },
  {
    id: "gcwr",
    term: "GCWR (gross combined weight rating)",
    names: ["GCWR", "gross combined weight rating", "combined weight", "GCW"],
    definition:
      "The most the whole rig may weigh: the vehicle with everyone and everything in it, plus the loaded trailer; from the owner's manual.",
  },
  {
    id: "payload",
    term: "Payload",
    names: ["payload"],
    definition:
      "What the vehicle may carry on top of its curb weight: people, cargo, hitch parts and the tongue weight all count; GVWR minus curb weight, or the label's figure if lower.",
  },
  {
    id: "curb-weight",
    term: "Curb weight",
    names: ["curb weight", "kerb weight", "empty vehicle"],
    definition: "The vehicle empty, with a full tank and its standard equipment, no people or cargo: weigh it so, or take the maker's figure.",
  },
  {
    id: "tow-rating",
    term: "Tow rating",
    names: ["tow rating"],
    definition: "The heaviest trailer the vehicle maker allows for this vehicle as built; a part can never raise it.",
  },
  {
    id: "tongue-weight-limit",
    term: "Tongue-weight limit",
    names: ["tongue-weight limit", "tongue weight limit", "tongue rating", "TW rating"],
    definition: "The most tongue weight a vehicle or a part may carry, from the owner's manual or the part's label.",
  },
  {
    id: "weakest-link",
    term: "Weakest link (governing rating)",
    names: ["weakest link", "governing", "governs", "lowest rating"],
    definition: "Of all the ratings in the chain from vehicle to trailer, the lowest one is the limit for the whole rig.",
  },
  {
    id: "hitch-class",
    term: "Hitch class",
    names: ["hitch class", "class"],
    definition:
      "A ceiling on what a hitch of that class may be rated for, set by SAE J684 from Class 1 (lightest) to Class 4; the hitch's own label gives its rating, which may be lower. \"Class 5\" is trade usage, not in the standard.",
  },
  {
    id: "receiver",
    term: "Receiver",
    names: ["receiver", "receiver opening", "receiver height"],
    definition: "The square tube under the rear of the vehicle that takes the ball mount's or the rack's shank, held by a pin.",
  },
  {
    id: "pin-hole",
    term: "Pin hole",
    names: ["pin hole", "hitch pin", "pin to"],
    definition: "The hole through the receiver and the shank where the hitch pin goes; the point most hitch distances are measured from.",
  },
  {
    id: "shank",
    term: "Shank",
    names: ["shank"],
    definition: "The square bar of a ball mount, rack or extender that slides into the receiver.",
  },
  {
    id: "ball-shank",
    term: "Ball shank",
    names: ["ball shank", "ball's shank"],
    definition: "The threaded stem under a hitch ball that goes through the ball mount's hole; its diameter must match the hole, or a rated reducer sleeve must fill the gap.",
  },
  {
    id: "reducer-sleeve",
    term: "Reducer sleeve",
    names: ["reducer sleeve", "ball reducer sleeve", "bushing"],
    definition: "A rated bushing that fills a ball mount's hole round a thinner ball shank; it carries the whole trailer, so its own label is a link.",
  },
  {
    id: "receiver-adapter",
    term: "Receiver adapter",
    names: ["receiver adapter", "receiver-size adapter"],
    definition: "A short sleeve that lets a shank of one size go into a receiver of another; it carries the whole load, so its own label is a link.",
  },
  {
    id: "tyre-load",
    term: "Tyre load capacity",
    names: ["tyre load", "tyre load capacity", "tyres", "tire load"],
    definition: "The most one tyre may carry at its maker's pressure, moulded on its sidewall as a maximum load or a load index.",
  },
  {
    id: "trailer-gvwr",
    term: "Trailer GVWR",
    names: ["trailer GVWR", "trailer axle rating", "plated maximum mass"],
    definition: "The trailer's own gross weight rating and axle ratings, on its plate: the loaded trailer and its axles must stay within them.",
  },
  {
    id: "shank-rise",
    term: "Shank rise",
    names: ["shank rise", "raised shank"],
    definition:
      "How far a rack's shank lifts the rack above the receiver; more rise clears ramps, but often lowers the rack maker's rating and can hide the lights or the number plate.",
  },
  {
    id: "ball-mount",
    term: "Ball mount",
    names: ["ball mount"],
    definition: "The removable bar that slides into the receiver and carries the ball; its rise or drop sets the ball's height.",
  },
  {
    id: "ball-platform",
    term: "Ball platform",
    names: ["ball platform"],
    definition: "The flat end of the ball mount, with the hole the ball is bolted through.",
  },
  {
    id: "rise-drop",
    term: "Rise or drop",
    names: ["drop", "rise or drop", "a rise"],
    definition:
      "How far the ball platform sits below (drop) or above (rise) the top of the shank; the right one keeps the trailer level, neither nose-up nor nose-down.",
  },
  {
    id: "squat",
    term: "Squat",
    names: ["squat"],
    definition: "How far the receiver comes down once the trailer is hitched: receiver height unhitched minus receiver height hitched.",
  },
  {
    id: "coupler",
    term: "Coupler",
    names: ["coupler"],
    definition: "The socket at the front of the trailer's tongue that closes over the ball; its latch must be shut and pinned.",
  },
  {
    id: "ball",
    term: "Ball",
    names: ["ball size", "ball rating", "hitch ball"],
    definition: "The hitch ball the coupler sits on; its size and rating are stamped on top and must match the coupler.",
  },
  {
    id: "safety-chains",
    term: "Safety chains",
    names: ["safety chain", "safety chains"],
    definition: "Two chains from the trailer to the hitch, crossed under the tongue, that hold the trailer if it comes off the ball.",
  },
  {
    id: "breakaway",
    term: "Breakaway device",
    names: ["breakaway"],
    definition: "A switch and small battery on a braked trailer that set its brakes if it comes off the vehicle; its cable clips to the vehicle, not to a chain.",
  },
  {
    id: "brake-controller",
    term: "Brake controller",
    names: ["brake controller"],
    definition: "The unit in the vehicle that works a trailer's electric brakes in step with the vehicle's own, with a gain set for the load.",
  },
  {
    id: "surge-brakes",
    term: "Surge brakes",
    names: ["surge", "surge brakes"],
    definition:
      "Trailer brakes worked by the trailer pushing against the ball as the vehicle slows, with no wiring to a controller; many weight-distribution makers restrict their use together.",
  },
  {
    id: "fascia",
    term: "Fascia",
    names: ["fascia"],
    definition: "The cover of the rear bumper; its furthest point back is what a folding rack must clear.",
  },
  {
    id: "extender",
    term: "Extender",
    names: ["extender"],
    definition: "A short receiver-to-receiver bar that moves the pin hole further back; its makers usually cut the rating, often by half, and some forbid it with weight distribution.",
  },
  {
    id: "departure-angle",
    term: "Departure angle",
    names: ["departure angle"],
    definition:
      "The steepest slope the vehicle can leave without its rear touching, as 49 CFR 523.2 defines it: a hitch-mounted load should not sit below that line.",
  },
  {
    id: "wheelbase",
    term: "Wheelbase",
    names: ["wheelbase"],
    definition: "Centre of the front wheel to centre of the rear wheel.",
  },
  {
    id: "overhang",
    term: "Overhang (rear axle to pin hole, and on to the ball)",
    names: ["overhang", "rear axle to pin hole", "rear axle to pin", "rear axle to ball"],
    definition:
      "How far behind the rear axle centre the load acts. Measured: rear axle centre to the receiver pin hole, along the ground; the ball mount's length and any extender reach the ball, or a rack's load sits its own distance on.",
  },
  {
    id: "axle-load",
    term: "Axle load",
    names: ["axle load", "axle loads", "front axle", "rear axle"],
    definition: "What one axle carries, weighed at a public axle scale; a load behind the rear axle adds more than itself to the rear and lightens the front.",
  },
  {
    id: "hitch-hardware",
    term: "Hitch hardware",
    names: ["hitch hardware", "hitch parts"],
    definition: "The ball mount, weight-distribution head and bars and anything else fitted at the hitch: it rides in the vehicle's payload.",
  },
  {
    id: "envelope",
    term: "Trailer envelope",
    names: ["envelope"],
    definition: "Every pair of trailer weight and tongue weight the rig allows as loaded, all its limits taken together.",
  },
  {
    id: "accessory",
    term: "Rack or carrier (accessory)",
    names: ["accessory", "rack", "carrier"],
    definition: "A bike rack or cargo carrier in the receiver; its weight and load, levered out behind the pin, count against the hitch's tongue rating.",
  },
  {
    id: "bed-hitch",
    term: "Fifth wheel and gooseneck (bed hitch)",
    names: ["fifth wheel", "fifth-wheel", "gooseneck", "bed hitch", "kingpin", "pin box"],
    definition:
      "A hitch in the pickup's bed, over or just ahead of the rear axle: a fifth wheel's jaws take the trailer's kingpin, a gooseneck's ball takes its coupler. No ball mount, receiver or weight distribution is used.",
  },
  {
    id: "pin-weight",
    term: "Pin weight",
    names: ["pin weight", "kingpin weight", "pin-weight share"],
    definition: "The share of a fifth-wheel or gooseneck trailer's weight that presses down on the bed hitch, usually 15 to 25 % of the trailer; it counts against the payload like a tongue weight.",
  },
  {
    id: "front-axle-loss",
    term: "Front-axle load loss",
    names: ["front-axle load loss", "front-axle loss", "load the front axle loses"],
    definition:
      "The load a hitch load behind the rear axle lifts off the steering axle (hitch load × overhang ÷ wheelbase); weight distribution gives part of it back. The limit on it is common practice, with no published source.",
  },
  {
    id: "sae-j2807",
    term: "SAE J2807",
    names: ["SAE", "J2807"],
    definition: "The published method vehicle makers follow for tow ratings; owner's manuals give its fender-height way of setting weight distribution.",
  },
] as const satisfies readonly GlossaryTerm[];

export type TermId = (typeof TERMS)[number]["id"];

export const TERM_BY_ID: Record<TermId, GlossaryTerm> = Object.fromEntries(TERMS.map((t) => [t.id, t])) as unknown as Record<TermId, GlossaryTerm>;

export interface SymbolEntry {
  /** What the symbol stands for, in one plain phrase. */
  meaning: string;
  /** The term it belongs to, if it has one. */
  term?: TermId;
}

/**
 * Every symbol the worked steps use, with what it stands for. The anchor of a symbol is `sym-<symbol>`.
 * A numbered family (T_1, T_2, …) has one entry under its stem with "_n".
 */
export const SYMBOLS: Record<string, SymbolEntry> = {
  // Weights of the rig
  GTW: { meaning: "gross trailer weight", term: "gross-trailer-weight" },
  TW: { meaning: "tongue weight", term: "tongue-weight" },
  GVWR: { meaning: "gross vehicle weight rating", term: "gvwr" },
  GVW: { meaning: "what the vehicle weighs, loaded and hitched", term: "gvwr" },
  GCWR: { meaning: "gross combined weight rating", term: "gcwr" },
  GCW: { meaning: "what the whole rig weighs, vehicle and trailer", term: "gcwr" },
  GAWR_R: { meaning: "rear gross axle weight rating", term: "gawr" },
  W_curb: { meaning: "curb weight", term: "curb-weight" },
  W_occ: { meaning: "everyone who rides, together", term: "payload" },
  W_cargo: { meaning: "cargo in the vehicle", term: "payload" },
  W_hw: { meaning: "hitch hardware", term: "hitch-hardware" },
  W_veh: { meaning: "the loaded vehicle (or, weighed with weight distribution set, the load the vehicle carries from the trailer)", term: "gcwr" },
  W_load: { meaning: "what is already aboard (or on the rack)", term: "payload" },
  W_acc: { meaning: "the rack or carrier with its load", term: "accessory" },
  W_rack: { meaning: "the rack's or carrier's own weight", term: "accessory" },
  W: { meaning: "the weight in question: on the receiver, or the trailer's weight or tongue weight", term: "accessory" },
  W_eq: { meaning: "equivalent tongue load: the rack's weight scaled up for how far behind the pin it sits", term: "accessory" },
  P_cap: { meaning: "payload capacity", term: "payload" },
  P_label: { meaning: "payload printed on the vehicle's label", term: "payload" },
  P_used: { meaning: "payload used", term: "payload" },
  M_P: { meaning: "payload left", term: "payload" },
  // Ratings and limits
  R_veh: { meaning: "vehicle tow rating", term: "tow-rating" },
  R_hitch: { meaning: "hitch (receiver) gross trailer weight rating", term: "receiver" },
  R_ball: { meaning: "ball rating", term: "ball" },
  R_mount: { meaning: "ball mount rating", term: "ball-mount" },
  R_coupler: { meaning: "coupler rating", term: "coupler" },
  R_chain: { meaning: "each safety chain's rating", term: "safety-chains" },
  T_veh: { meaning: "vehicle tongue-weight limit", term: "tongue-weight-limit" },
  T_hitch: { meaning: "hitch tongue rating", term: "tongue-weight-limit" },
  T_mount: { meaning: "ball mount tongue rating", term: "ball-mount" },
  T_wd: { meaning: "weight-distribution tongue rating", term: "weight-distribution" },
  T_ext: { meaning: "extender tongue rating", term: "extender" },
  R_unbr: { meaning: "vehicle tow rating for a trailer without brakes", term: "tow-rating" },
  R_adapt: { meaning: "receiver adapter gross trailer weight rating", term: "receiver-adapter" },
  T_adapt: { meaning: "receiver adapter tongue rating", term: "receiver-adapter" },
  R_sleeve: { meaning: "ball reducer sleeve gross trailer weight rating", term: "reducer-sleeve" },
  T_sleeve: { meaning: "ball reducer sleeve tongue rating", term: "reducer-sleeve" },
  // The trailer's own labels and the tyres
  GVWR_t: { meaning: "the trailer's GVWR (its plated maximum mass)", term: "trailer-gvwr" },
  M_GVWR_t: { meaning: "room left on the trailer's GVWR", term: "trailer-gvwr" },
  W_ax: { meaning: "load on the trailer's axles: gross trailer weight less the tongue weight", term: "trailer-gvwr" },
  n_ax: { meaning: "how many axles the trailer has", term: "trailer-gvwr" },
  GAWR_t: { meaning: "each trailer axle's rating", term: "trailer-gvwr" },
  C_ax: { meaning: "the trailer's axle ratings together", term: "trailer-gvwr" },
  M_ax: { meaning: "room left on the trailer's axles", term: "trailer-gvwr" },
  L_tf: { meaning: "each front tyre's maximum load", term: "tyre-load" },
  C_tf: { meaning: "the front tyres' maximum load together", term: "tyre-load" },
  F_ax: { meaning: "front axle load the tyres carry (the larger of unhitched and hitched)", term: "axle-load" },
  M_tf: { meaning: "room left on the front tyres", term: "tyre-load" },
  n_tr: { meaning: "how many tyres the rear axle has (two, four with dual wheels)", term: "tyre-load" },
  L_tr: { meaning: "each rear tyre's maximum load", term: "tyre-load" },
  C_tr: { meaning: "the rear tyres' maximum load together", term: "tyre-load" },
  R_ax: { meaning: "rear axle load the tyres carry, as driven", term: "axle-load" },
  M_tr: { meaning: "room left on the rear tyres", term: "tyre-load" },
  n_tt: { meaning: "how many tyres the trailer has (two per axle)", term: "tyre-load" },
  L_tt: { meaning: "each trailer tyre's maximum load", term: "tyre-load" },
  C_tt: { meaning: "the trailer tyres' maximum load together", term: "tyre-load" },
  M_tt: { meaning: "room left on the trailer's tyres", term: "tyre-load" },
  // Hardware fit
  D_ball: { meaning: "the ball's diameter", term: "ball" },
  D_min: { meaning: "the smallest ball diameter the trailer's class allows (15 CRR-NY 57.5 Table 1)", term: "ball" },
  M_ball: { meaning: "how much larger the ball is than the smallest allowed (negative: too small)", term: "ball" },
  D_hole: { meaning: "the ball mount hole's diameter", term: "ball-shank" },
  D_shank: { meaning: "the ball shank's diameter", term: "ball-shank" },
  G_shank: { meaning: "room round the shank in the hole (negative: it does not go in)", term: "ball-shank" },
  D_pinhole: { meaning: "the hitch pin a receiver of that size usually takes (common practice, no published source)", term: "pin-hole" },
  D_pin: { meaning: "the hitch pin's diameter", term: "pin-hole" },
  G_pin: { meaning: "the usual pin minus the pin entered (not zero: it does not suit)", term: "pin-hole" },
  R_bed: { meaning: "bed hitch (fifth wheel or gooseneck) gross trailer weight rating", term: "bed-hitch" },
  T_bed: { meaning: "bed hitch pin weight rating", term: "pin-weight" },
  T_n: { meaning: "one of the tongue ratings the rack is checked against (T_1, T_2, …)", term: "tongue-weight-limit" },
  GTW_max: { meaning: "the lowest gross trailer weight rating", term: "weakest-link" },
  TW_max: { meaning: "the lowest tongue-weight rating", term: "weakest-link" },
  M_GTW: { meaning: "room left on the gross trailer weight", term: "weakest-link" },
  M_TW: { meaning: "room left on the tongue weight", term: "weakest-link" },
  M_GCW: { meaning: "room left under the GCWR", term: "gcwr" },
  M_T: { meaning: "room left on the tongue capacity", term: "tongue-weight-limit" },
  T_vh: { meaning: "the lowest tongue rating of the vehicle and the hitch (extender aside)", term: "tongue-weight-limit" },
  M_lever: { meaning: "room left for the lever effect: that rating minus the equivalent load", term: "accessory" },
  L_wc: { meaning: "the closest weight-carrying limit", term: "weight-carrying" },
  M_wc: { meaning: "room left on the closest weight-carrying limit", term: "weight-carrying" },
  // The envelope
  G_gcwr: { meaning: "the trailer weight the GCWR leaves", term: "envelope" },
  T_payload: { meaning: "the tongue weight the payload left allows", term: "envelope" },
  T_axle: { meaning: "the tongue weight the rear GAWR allows", term: "envelope" },
  k_R: { meaning: "rear axle load gained per unit of tongue weight", term: "axle-load" },
  G_lim: { meaning: "the lowest limit on the trailer's weight", term: "envelope" },
  T_lim: { meaning: "the lowest limit on the tongue weight", term: "envelope" },
  G_max: { meaning: "the heaviest trailer the envelope allows", term: "envelope" },
  T_max: { meaning: "the most tongue weight the envelope allows", term: "envelope" },
  s_min: { meaning: "the lowest tongue-weight share of the band", term: "tongue-share" },
  s_max: { meaning: "the highest tongue-weight share of the band", term: "tongue-share" },
  s: { meaning: "tongue-weight share (or, for a ball mount, the expected squat)", term: "tongue-share" },
  TW_est_max: { meaning: "the highest tongue weight the band gives, an estimate", term: "tongue-share" },
  // Axles and lengths
  WB: { meaning: "wheelbase", term: "wheelbase" },
  OH: { meaning: "overhang: rear axle centre to where the hitch load acts", term: "overhang" },
  F_0: { meaning: "front axle load, unhitched", term: "axle-load" },
  R_0: { meaning: "rear axle load, unhitched", term: "axle-load" },
  F_w: { meaning: "front axle as weighed", term: "axle-load" },
  R_w: { meaning: "rear axle as weighed", term: "axle-load" },
  F_h: { meaning: "front axle load, hitched", term: "axle-load" },
  R_h: { meaning: "rear axle load, hitched", term: "axle-load" },
  R_max: { meaning: "rear axle load with the weight distribution released, the heaviest it can be until the fender heights are measured", term: "weight-distribution" },
  F_u: { meaning: "front axle load, unhitched, as weighed", term: "axle-load" },
  R_u: { meaning: "rear axle load, unhitched, as weighed", term: "axle-load" },
  F_wd: { meaning: "front axle load with weight distribution set", term: "weight-distribution" },
  R_wd: { meaning: "rear axle load with weight distribution set", term: "weight-distribution" },
  dF: { meaning: "change on the front axle (negative: load taken off)", term: "axle-load" },
  dR: { meaning: "change on the rear axle", term: "axle-load" },
  // Front-axle load loss
  L_F: { meaning: "load the front axle loses to the hitch load, with nothing given back (negative: it gains)", term: "front-axle-loss" },
  L_wd: { meaning: "load the front axle still loses with weight distribution set", term: "front-axle-loss" },
  L: { meaning: "load the front axle loses as driven", term: "front-axle-loss" },
  L_max: { meaning: "the most the front axle may lose: the organisation's limit times its unhitched load", term: "front-axle-loss" },
  L_t: { meaning: "load the front axle would still lose with weight distribution set to the target", term: "front-axle-loss" },
  k_F: { meaning: "the organisation's front-axle loss limit, as a share of the unhitched front axle (common practice, no published source)", term: "front-axle-loss" },
  s_F: { meaning: "share of the front axle's unhitched load that it loses", term: "front-axle-loss" },
  // Weight distribution
  H1: { meaning: "front fender height, unhitched", term: "fender-height" },
  H2: { meaning: "front fender height, hitched, bars released", term: "fender-height" },
  H3: { meaning: "front fender height, hitched, bars set", term: "fender-height" },
  H3_target: { meaning: "the front fender height to aim for", term: "fender-height" },
  t: { meaning: "restoration target (the share of the lost front load to give back)", term: "restoration" },
  R: { meaning: "restoration, measured or taken at the target", term: "restoration" },
  FALR: { meaning: "front axle load restoration", term: "restoration" },
  // Ball mount
  H_r: { meaning: "receiver height: ground to the top inside edge of the opening", term: "receiver" },
  H_c: { meaning: "coupler height: ground to the bottom of the coupler, trailer level", term: "coupler" },
  D: { meaning: "drop needed to ride level (negative: a rise)", term: "rise-drop" },
  D_mount: { meaning: "the ball mount's drop (negative: a rise)", term: "rise-drop" },
  e: { meaning: "how far off level (or, for a rack, the extender's length)", term: "rise-drop" },
  // Rack or carrier
  d: { meaning: "pin hole to the centre of the rack's load", term: "accessory" },
  d_ref: { meaning: "reference arm: the distance behind the pin a tongue rating is taken to apply at (common practice, no published source)", term: "accessory" },
  k: { meaning: "a multiplier: the lever effect of a rack's distance behind the pin, or a beam's lever ratio when weighing a tongue" },
  P_f: { meaning: "pin hole to the fascia", term: "fascia" },
  C_fold: { meaning: "clearance the folded rack needs", term: "fascia" },
  M_fold: { meaning: "room left when folded", term: "fascia" },
  r: { meaning: "shank rise", term: "shank-rise" },
  r_add: { meaning: "extra shank rise needed to keep the departure angle", term: "shank-rise" },
  h_low: { meaning: "how far the rack's lowest point sits below the top of its shank", term: "accessory" },
  h: { meaning: "height of the rack's lowest point above the ground", term: "departure-angle" },
  x: { meaning: "rear axle to the rack's lowest point", term: "departure-angle" },
  alpha: { meaning: "angle from the rear tyre to the rack's lowest point", term: "departure-angle" },
  beta: { meaning: "the vehicle's departure angle", term: "departure-angle" },
  // Measuring tongue weight
  S: { meaning: "scale reading", term: "tongue-weight" },
  a: { meaning: "beam: block to jack", term: "tongue-weight" },
  b: { meaning: "beam: jack to scale", term: "tongue-weight" },
};

/** The glossary entry of a step symbol: its own, or its numbered family's (T_1 → T_n). */
export function symbolEntry(symbol: string): SymbolEntry | undefined {
  return SYMBOLS[symbol] ?? SYMBOLS[symbol.replace(/_\d+$/, "_n")];
}

/** The anchor of a symbol's definition. */
export function symbolAnchor(symbol: string): string {
  const key = SYMBOLS[symbol] ? symbol : symbol.replace(/_\d+$/, "_n");
  return `sym-${key.replace(/[^A-Za-z0-9_-]/g, "")}`;
}

export function termAnchor(id: TermId | string): string {
  return `term-${id}`;
}

function escape(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
}

/**
 * The terms a text uses, in glossary order: matched on whole words, case-insensitive for words and exact for
 * abbreviations (so "tw" inside a word, or "class" in "classic", is not taken).
 */
export function termsIn(texts: Iterable<string>): GlossaryTerm[] {
  const all = [...texts].join("\n");
  return TERMS.filter((t) =>
    t.names.some((name) => {
      const abbreviation = /^[A-Z0-9]{2,}$/.test(name);
      return new RegExp(`(^|[^A-Za-z0-9])${escape(name)}(?=$|[^A-Za-z0-9])`, abbreviation ? "" : "i").test(all);
    }),
  );
}

// ---------------------------------------------------------------- plain words for the customer

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
    line: "How much the vehicle itself can carry: people, luggage, the hitch parts and the weight pressing down on the hitch all count.",
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
    line: "Whether the hitch ball sits at the right height for the trailer to ride level, neither nose-up nor nose-down.",
  },
  "accessory-fit": {
    title: "Rack or carrier fit",
    line: "Whether the rack or carrier, with its load, suits the hitch, folds clear of the bumper and clears the ground.",
  },
  envelope: {
    title: "How heavy a trailer fits",
    line: "The heaviest trailer, and the most weight on its tongue, this vehicle could take as it is loaded today.",
  },
  "front-axle-loss": {
    title: "Grip on the steering wheels",
    line: "How much weight the hitch load lifts off the front wheels, which steer and brake, against the limit your organisation set.",
  },
  "trailer-labels": {
    title: "The trailer's own limits",
    line: "Whether the loaded trailer and its axles stay within the ratings on the trailer's own plate.",
  },
  tyres: {
    title: "Tyres",
    line: "Whether each axle's tyres, on the vehicle and on the trailer, are made to carry the load on them.",
  },
  "hardware-fit": {
    title: "Parts that fit together",
    line: "Whether the ball suits the trailer's weight and the ball, ball mount, hitch pin and receiver are the right sizes for each other.",
  },
  "local-rules": {
    title: "The rules where you drive",
    line: "What the law where the rig is driven asks of it (brakes, licence, coupling), each rule with its source.",
  },
};

/** The plain title of a check, for lists such as "these checks still lack figures". */
export function plainTitle(id: CheckId): string {
  return CHECK_WORDS[id]?.title ?? id;
}

/**
 * What each status means for the customer: a rating exceeded, a set-up to adjust, little room left, room to
 * spare, or figures missing. Keyed by the status names the core gives.
 */
export const STATUS_MEANING: Record<"over" | "adjust" | "tight" | "within" | "incomplete", { word: string; verdict: string; check: string }> = {
  over: {
    word: "Rating exceeded",
    verdict: "A rating is exceeded: do not tow like this. It needs a lighter load, or another vehicle or part.",
    check: "A rating is exceeded here: do not tow like this; it needs a lighter load, or another vehicle or part.",
  },
  adjust: {
    word: "Set-up to adjust",
    verdict: "No rating is exceeded, but the set-up needs adjusting before you tow. See what to do under each check.",
    check: "Nothing here is over a rating, but the set-up needs adjusting before you tow.",
  },
  tight: {
    word: "Tight",
    verdict: "It fits, with little room left on at least one rating. Weigh the loaded rig before you rely on it.",
    check: "It fits, with little room left: weigh it loaded before you rely on it.",
  },
  within: {
    word: "Within",
    verdict: "Every rating checked has room to spare.",
    check: "Room to spare.",
  },
  incomplete: {
    word: "Not confirmed yet",
    verdict: "Some figures are still missing, so the rig cannot be called within until they are in.",
    check: "Some figures are missing, so this could not be checked yet.",
  },
};
