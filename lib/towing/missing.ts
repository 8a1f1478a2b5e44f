/** What to measure and where to find it, for each input field a check may need. */
import type { MissingField } from "./types";

const HELP: Record<string, [what: string, where: string]> = {
  "vehicle.towRating": ["The vehicle's tow rating without weight distribution", "Owner's manual, towing section"],
  "vehicle.towRatingWd": ["The vehicle's tow rating with weight distribution", "Owner's manual, towing section"],
  "vehicle.tongueWeightLimit": ["The vehicle's tongue-weight limit", "Owner's manual, towing section"],
  "vehicle.tongueWeightLimitWd": ["The vehicle's tongue-weight limit with weight distribution", "Owner's manual, towing section"],
  "vehicle.gvwr": ["The gross vehicle weight rating (GVWR)", "Door-jamb label (driver's side)"],
  "vehicle.curbWeight": ["The curb weight (the vehicle empty, with a full tank), or the payload figure on the label", "Weigh it empty with a full tank, or take the maker's figure; the tyre and loading label gives occupants plus cargo, not the curb weight"],
  "vehicle.gcwr": ["The gross combined weight rating (GCWR)", "Owner's manual, towing section"],
  "vehicle.gawrFront": ["The front gross axle weight rating", "Door-jamb label"],
  "vehicle.gawrRear": ["The rear gross axle weight rating", "Door-jamb label"],
  "vehicle.axleWeights": ["Each axle's load with the vehicle loaded as it will travel, unhitched", "A public axle scale"],
  "vehicle.wheelbase": ["The wheelbase, front axle centre to rear axle centre", "Owner's manual or a tape measure"],
  "vehicle.rearAxleToPin": ["Distance from the rear axle centre to the receiver pin hole, along the ground", "Tape measure, or the figure an installer records after fitting"],
  "ballMount.length": ["The ball mount's length, pin hole to the ball's centre", "Tape measure, or the ball mount maker's sheet"],
  "vehicle.departureAngle": ["The vehicle's departure angle", "Owner's manual, dimensions page"],
  "hitch.gtwRating": ["The hitch's gross trailer weight rating, weight-carrying", "Hitch label or stamp (the class only sets a ceiling)"],
  "hitch.twRating": ["The hitch's tongue weight rating, weight-carrying", "Hitch label or stamp"],
  "hitch.gtwRatingWd": ["The hitch's gross trailer weight rating with weight distribution", "Hitch label or stamp"],
  "hitch.twRatingWd": ["The hitch's tongue weight rating with weight distribution", "Hitch label or stamp"],
  "hitch.receiverHeight": ["Height from the ground to the top inside of the receiver opening", "Tape measure, vehicle loaded as it will travel"],
  "hitch.pinToFascia": ["Distance from the receiver pin hole to the outermost point of the bumper fascia", "Tape measure"],
  "trailer.grossTrailerWeight": ["The loaded trailer's weight", "A public scale, trailer loaded as it will travel"],
  "trailer.tongueWeight": ["The trailer's tongue weight, loaded as it will travel", "A tongue scale, a bathroom scale and beam, or a public scale"],
  "trailer.couplerHeight": ["Height from the ground to the bottom of the coupler, trailer level", "Tape measure"],
  "trailer.couplerRating": ["The coupler's rating", "Stamp on the coupler"],
  "trailer.ballRating": ["The ball's rating", "Stamp on the top of the ball"],
  "trailer.safetyChainRating": ["Each safety chain's rating", "Tag or stamp on the chain"],
  "ballMount.gtwRating": ["The ball mount's gross trailer weight rating", "Stamp or label on the ball mount"],
  "ballMount.twRating": ["The ball mount's tongue weight rating", "Stamp or label on the ball mount"],
  "ballMount.drop": ["The ball mount's rise or drop: top of the shank to the top of the ball platform", "Stamp on the ball mount, or a tape measure"],
  "weightDistribution.fenderUnhitched": ["Front fender height unhitched: ground to the lip of the front wheel opening, straight above the wheel centre", "Tape measure on level ground, at the same point each time"],
  "weightDistribution.fenderHitched": ["Front fender height hitched, spring bars released (ground to the wheel-opening lip)", "Tape measure, same point, trailer chocked"],
  "weightDistribution.fenderWithWd": ["Front fender height hitched, spring bars set as they will travel (ground to the wheel-opening lip)", "Tape measure, same point; set the bars with the maker's handle and keep hands clear"],
  "weightDistribution.tongueRating": ["The weight distribution system's tongue rating", "Label on the spring bars or head"],
  "load.occupants": ["The total weight of everyone who rides", "Ask, or weigh"],
  "load.cargo": ["The weight of the cargo in the vehicle", "Weigh it, or weigh the loaded vehicle"],
  "load.hitchHardware": ["The weight of the ball mount or weight-distribution head and bars", "Maker's sheet, or a bathroom scale"],
  "accessory.weight": ["The rack's or carrier's own weight", "Maker's sheet or a bathroom scale"],
  "accessory.loadWeight": ["The weight of what rides on it", "A bathroom scale"],
  "accessory.loadCenterFromPin": ["Distance from the receiver pin hole to the centre of the load", "Tape measure"],
  "accessory.foldClearance": ["Distance the folded accessory needs between the pin hole and the fascia", "Maker's sheet"],
  "accessory.lowestPointBelowShankTop": ["How far the accessory's lowest point sits below the top of its shank", "Tape measure"],
  "accessory.lowestPointBehindPin": ["How far behind the pin hole the accessory's lowest point sits", "Tape measure"],
};

export function need(field: string): MissingField {
  const h = HELP[field];
  return h ? { field, what: h[0], where: h[1] } : { field, what: field, where: "Owner's manual or the labels" };
}
