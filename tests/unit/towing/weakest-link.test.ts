import { describe, expect, it } from "vitest";
import { convertRig, evaluateRig, type WeakestLinkResult } from "@/lib/towing";
import { CLASS_MAX_GTW } from "@/lib/towing/reference";
import { check, pickupRig, rig } from "./helpers";

const wl = (r: ReturnType<typeof pickupRig>) => check<WeakestLinkResult>(evaluateRig(r), "weakest-link");

describe("weakest link", () => {
  it("names the class 3 receiver as the governing gross-weight link", () => {
    const res = wl(pickupRig());
    // Source: WAC 204-70-060 (the weakest component governs): of the gross ratings entered (vehicle 7,000, hitch
    // 4,500, ball 6,000, ball mount 6,000, coupler 6,000, chains 6,000 lb) the hitch's 4,500 lb is the lowest
    expect(res.governingGrossTrailerWeight?.value).toBe(4500);
    expect(res.governingGrossTrailerWeight?.id).toBe("hitch.gtwRating");
    // Source: WAC 204-70-060: of the tongue ratings entered (vehicle 700, hitch 675, ball mount 800 lb) the lowest
    expect(res.governingTongueWeight?.value).toBe(675);
    // Physics: arithmetic, 4,500 − 4,000 = 500 lb left, 11.1 % of the rating
    const hitchLink = res.links.find((l) => l.id === "hitch.gtwRating")!;
    expect(hitchLink.margin?.value).toBeCloseTo(500, 9);
    expect(hitchLink.margin?.ratio).toBeCloseTo(500 / 4500, 12);
    expect(res.status).toBe("within");
  });

  it("raises the receiver's gross rating to 5,000 lb with weight distribution while the tongue rating stays 675 lb", () => {
    const withWd = wl(pickupRig({ trailer: { grossTrailerWeight: 4800, tongueWeight: 600 }, weightDistribution: { used: true, tongueRating: 1000 } }));
    // With weight distribution the label's weight-distributing line is the link (5,000 lb gross, 675 lb tongue),
    // not the weight-carrying line.
    expect(withWd.links.find((l) => l.id === "hitch.gtwRatingWd")?.rating.value).toBe(5000);
    expect(withWd.links.some((l) => l.id === "hitch.gtwRating")).toBe(false);
    expect(withWd.links.find((l) => l.id === "hitch.twRatingWd")?.rating.value).toBe(675);
    expect(withWd.links.find((l) => l.id === "hitch.gtwRatingWd")?.status).toBe("tight"); // 200 lb of 5,000 lb is 4 %
    const noWd = wl(pickupRig({ trailer: { grossTrailerWeight: 4800, tongueWeight: 600 } }));
    // Common practice, no published source: 4,800 lb is over the 4,500 lb weight-carrying rating
    expect(noWd.status).toBe("over");
    expect(noWd.links.find((l) => l.id === "hitch.gtwRating")?.status).toBe("over");
  });

  it("goes by the lowest of the vehicle's and the hitch's numbers", () => {
    const res = wl(pickupRig({ vehicle: { towRating: 3500, tongueWeightLimit: 350 }, trailer: { grossTrailerWeight: 3000, tongueWeight: 330 } }));
    // Common practice, no published source: go by the lowest of the vehicle's and the hitch's numbers
    expect(res.governingGrossTrailerWeight?.id).toBe("vehicle.towRating");
    expect(res.governingGrossTrailerWeight?.value).toBe(3500);
    expect(res.governingTongueWeight?.value).toBe(350);
    // Source: Washington WAC 204-70-060 (the weakest component governs): 20 lb of 350 lb left is tight
    expect(res.governing?.id).toBe("vehicle.tongueWeightLimit");
    expect(res.status).toBe("tight");
  });

  it("requires each safety chain to be rated for the gross trailer weight", () => {
    const res = wl(pickupRig({ hitch: { gtwRating: 10000, gtwRatingWd: 10000, twRating: 1000, twRatingWd: 1000 }, trailer: { grossTrailerWeight: 5200, tongueWeight: 600, safetyChainRating: 5000 } }));
    // Source: Washington WAC 204-70-070; New Hampshire RSA 266:63 — each chain at least the gross trailer weight
    expect(res.links.find((l) => l.id === "trailer.safetyChainRating")?.status).toBe("over");
    expect(res.status).toBe("over");
  });

  it("knows the hitch classes' maximum trailer weights", () => {
    // Source: New York 15 NYCRR 57.3(c) (adopts SAE J684); Ontario Ministry of Transportation
    expect(CLASS_MAX_GTW[1]).toBe(2000);
    expect(CLASS_MAX_GTW[2]).toBe(3500); // Source: New York 15 NYCRR 57.3(c) (adopts SAE J684)
    expect(CLASS_MAX_GTW[3]).toBe(5000); // Source: New York 15 NYCRR 57.3(c) (adopts SAE J684)
    expect(CLASS_MAX_GTW[4]).toBe(10000); // Source: New York 15 NYCRR 57.3(c) (adopts SAE J684)
    const res = wl(pickupRig({ hitch: { class: 2, gtwRating: 6000, twRating: 700 }, trailer: { grossTrailerWeight: 3600 } }));
    expect(res.cautions.some((t) => t.includes("class 2") && t.includes("3,500 lb"))).toBe(true);
  });

  it("flags a ball that does not match the coupler", () => {
    const res = wl(pickupRig({ trailer: { ballSize: "1-7/8", couplerBallSize: "2" } }));
    // Source: 15 CRR-NY 57.5 Table 1 (ball and coupler sized together); a ball to change is a set-up to adjust
    expect(res.status).toBe("adjust");
    expect(res.advice[0]).toContain("2 in ball");
  });

  it("reports missing ratings and where to find them, but keeps a known over", () => {
    const missing = wl(pickupRig({ hitch: { gtwRating: undefined, gtwRatingWd: undefined, class: 3 } }));
    expect(missing.status).toBe("incomplete");
    expect(missing.missing?.find((m) => m.field === "hitch.gtwRating")?.where).toContain("Hitch label");
    const over = wl(pickupRig({ hitch: { gtwRating: undefined, gtwRatingWd: undefined }, vehicle: { towRating: 3000 } }));
    expect(over.status).toBe("over");
  });

  it("gives the same links in kilograms", () => {
    const r = pickupRig();
    const imp = wl(r);
    const met = wl(convertRig(r, "metric"));
    expect(met.governingGrossTrailerWeight?.id).toBe(imp.governingGrossTrailerWeight?.id);
    // Source: exact definition of the pound, 0.45359237 kg (From memory: international yard and pound agreement, 1959)
    expect(met.governingGrossTrailerWeight?.value).toBeCloseTo(4500 * 0.45359237, 9);
    expect(met.governingGrossTrailerWeight?.unit).toBe("kg");
    // Arithmetic: 4,500 − 4,000 = 500 lb left = 226.796185 kg (exact definition of the pound, as above)
    expect(met.margin?.value).toBeCloseTo(226.796185, 6);
    expect(met.status).toBe(imp.status);
  });
});

describe("weakest link: the unbraked tow rating, receiver adapters and reducer sleeves", () => {
  it("takes the vehicle's unbraked tow rating as a link when the trailer has no brakes", () => {
    // Source: Washington WAC 204-70-060 (the weakest component governs); vehicle owner's manuals give the unbraked
    // figure. 1,650 − 4,000 = −2,350 lb: over
    const res = wl(pickupRig({ vehicle: { towRatingUnbraked: 1650 }, trailer: { brakes: "none" } }));
    const link = res.links.find((l) => l.id === "vehicle.towRatingUnbraked")!;
    expect(link.rating.value).toBe(1650);
    expect(link.margin!.value).toBe(-2350);
    expect(res.status).toBe("over");
    expect(res.governingGrossTrailerWeight!.id).toBe("vehicle.towRatingUnbraked");
    expect(res.advice.join(" ")).toMatch(/no part can raise the vehicle's own rating.*a trailer with brakes/);
  });

  it("is incomplete, not a pass, without the unbraked figure when the trailer has no brakes", () => {
    const res = wl(pickupRig({ trailer: { brakes: "none", grossTrailerWeight: 1200, tongueWeight: 150 } }));
    expect(res.status).toBe("incomplete");
    expect(res.missing!.map((m) => m.field)).toContain("vehicle.towRatingUnbraked");
  });

  it("leaves the unbraked figure out when the trailer has brakes", () => {
    const res = wl(pickupRig({ vehicle: { towRatingUnbraked: 1650 } }));
    expect(res.links.some((l) => l.id === "vehicle.towRatingUnbraked")).toBe(false);
    expect(res.status).toBe("within");
  });

  it("metric: a 750 kg unbraked rating under a 700 kg trailer leaves 50 kg, tight", () => {
    // Arithmetic: 750 − 700 = 50 kg, 6.7 % of the rating: under the 10 % threshold
    const res = check<WeakestLinkResult>(
      evaluateRig(
        rig({
          units: "metric",
          vehicle: { towRating: 2000, towRatingUnbraked: 750, tongueWeightLimit: 100 },
          hitch: { gtwRating: 2000, twRating: 100 },
          trailer: { type: "utility", grossTrailerWeight: 700, tongueWeight: 60, tongueWeightBasis: "measured", ballRating: 1500, brakes: "none" },
        }),
      ),
      "weakest-link",
    );
    expect(res.governingGrossTrailerWeight!.id).toBe("vehicle.towRatingUnbraked");
    expect(res.governingGrossTrailerWeight!.unit).toBe("kg");
    expect(res.margin!.value).toBeCloseTo(50, 9);
    expect(res.status).toBe("tight");
  });

  it("a receiver adapter is a link of its own: its rating exceeded is over, a missing one incomplete", () => {
    // Source: WAC 204-70-060: the adapter's 3,500 lb is the lowest gross rating; 3,500 − 4,000 = −500 lb
    const over = wl(pickupRig({ receiverAdapter: { gtwRating: 3500, twRating: 600 } }));
    expect(over.governingGrossTrailerWeight!.id).toBe("receiverAdapter.gtwRating");
    expect(over.links.find((l) => l.id === "receiverAdapter.gtwRating")!.margin!.value).toBe(-500);
    expect(over.status).toBe("over");
    const blank = wl(pickupRig({ receiverAdapter: {} }));
    expect(blank.status).toBe("incomplete");
    expect(blank.missing!.map((m) => m.field)).toEqual(expect.arrayContaining(["receiverAdapter.gtwRating", "receiverAdapter.twRating"]));
  });

  it("a reducer sleeve's tongue rating exceeded is over", () => {
    // Source: WAC 204-70-060: 400 − 500 = −100 lb on the sleeve
    const res = wl(pickupRig({ trailer: { ballShankSize: "3/4" }, ballSleeve: { gtwRating: 6000, twRating: 400 } }));
    expect(res.links.find((l) => l.id === "ballSleeve.twRating")!.margin!.value).toBe(-100);
    expect(res.status).toBe("over");
  });
});
