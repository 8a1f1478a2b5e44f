import { describe, expect, it } from "vitest";
import { rigInputSchema } from "@/lib/towing/input";
import { CHECK_IDS } from "@/lib/towing/types";
import { CLASS_MAX_GTW } from "@/lib/towing/reference";
import { LESSON_FAMILIES, LIBRARY, libraryExample } from "@/lib/training/library";
import { markAttempt, prepareLesson } from "@/lib/training/prepare";

function keyFigure(slug: string, stepId = libraryExample(slug)!.keyStep) {
  const example = libraryExample(slug)!;
  const lesson = prepareLesson(example, example.rig)!;
  const step = lesson.steps.find((s) => s.id === stepId);
  if (!step) throw new Error(`${slug} has no step ${stepId}`);
  return { value: step.result.value, unit: step.result.unit, lesson };
}

describe("the built-in library", () => {
  it("has one example for each check family, each a valid rig that gives its steps", () => {
    const families = LIBRARY.map((example) => example.checkId);
    expect(new Set(families)).toEqual(new Set(LESSON_FAMILIES.map((family) => family.id)));
    // The local-rules check runs only where a place is chosen; it has no worked example in the library yet.
    expect(new Set(families)).toEqual(new Set(CHECK_IDS.filter((id) => id !== "local-rules")));
    expect(new Set(LIBRARY.map((e) => e.slug)).size).toBe(LIBRARY.length);
    for (const example of LIBRARY) {
      expect(rigInputSchema.safeParse(example.rig).success, example.slug).toBe(true);
      const lesson = prepareLesson(example, example.rig);
      expect(lesson?.steps.length, example.slug).toBeGreaterThan(0);
      expect(lesson!.steps.map((s) => s.id), example.slug).toContain(example.keyStep);
      expect(lesson!.conclusion.generalCautions.length, example.slug).toBeGreaterThan(0);
    }
  });

  it("weakest link: the Class 3 receiver governs at 5,000 lb", () => {
    const { value, unit } = keyFigure("lowest-rating-governs");
    // Source: New York 15 NYCRR 57.3(c) (adopts SAE J684): Class 3 ≤ 5,000 lb; Washington WAC 204-70-060 (the weakest component governs)
    expect(value).toBe(5000);
    expect(unit).toBe("lb");
    // Physics: arithmetic, 5,000 − 4,600 = 400 lb of room
    expect(keyFigure("lowest-rating-governs", "gtw-margin").value).toBe(400);
  });

  it("tongue share: 270 lb on a 3,000 lb trailer is 9 %, under the 10–15 % band", () => {
    const { value, lesson } = keyFigure("too-light-on-the-tongue");
    // Physics: arithmetic, 270 ÷ 3,000 = 9 %
    expect(value).toBeCloseTo(9, 9);
    // Source: GM and Nissan owner's manuals (conventional trailers: 10–15 % of the loaded trailer's weight)
    expect(value).toBeLessThan(10);
    // Below the band the load must move before towing: a set-up to adjust, not a rating exceeded
    expect(lesson.conclusion.status).toBe("adjust");
  });

  it("payload: GVWR 6,000 − curb 4,650 = 1,350 lb, and the family's 1,440 lb is over", () => {
    // Source: 49 CFR 567.4(g)(3) (payload = GVWR − unloaded vehicle weight)
    expect(keyFigure("family-full-of-payload").value).toBe(1350);
    // Source: GM (Cadillac) owner's manuals (tongue weight counts against payload): 750 + 200 + 450 + 40 = 1,440 lb
    expect(keyFigure("family-full-of-payload", "payload-used").value).toBe(1440);
  });

  it("combined weight: 6,060 lb loaded truck + 7,500 lb trailer = 13,560 lb, tongue not counted twice", () => {
    // Physics: combined weight = loaded vehicle (5,400 + 350 + 250 + 60) + whole trailer 7,500; the 900 lb tongue is already in the trailer
    const { value, lesson } = keyFigure("count-the-tongue-once");
    expect(value).toBe(13560);
    expect(value).not.toBe(13560 + 900);
    // Source: GM (Cadillac) owner's manuals (must not exceed GCWR): 13,560 lb > 13,000 lb
    expect(lesson.conclusion.status).toBe("over");
  });

  it("axle loads: WB 145 in, OH 50 in, TW 800 lb → rear +1,075.86 lb, front −275.86 lb", () => {
    // Physics: statics, moments about the front axle: 800 × (145 + 50) ÷ 145 = 1,075.86 lb
    expect(keyFigure("tongue-load-on-the-axles").value).toBeCloseTo(1075.86, 2);
    // Physics: statics, moments about the rear axle: −800 × 50 ÷ 145 = −275.86 lb
    expect(keyFigure("tongue-load-on-the-axles", "front-change").value).toBeCloseTo(-275.86, 2);
  });

  it("front-axle loss: an 800 lb tongue 50 in behind the axle lifts 275.86 lb off a 2,700 lb front axle", () => {
    // Physics: statics (REFERENCES: WB 145 in, OH 50 in, TW 800 lb → front −275.86 lb): 800 × 50 ÷ 145 = 275.86 lb
    expect(keyFigure("light-on-the-steering").value).toBeCloseTo(275.86, 2);
    // Arithmetic: 275.86 ÷ 2,700 = 10.2 %, beyond the default 10 % (common practice, no published source)
    expect(keyFigure("light-on-the-steering", "front-loss-share").value).toBeCloseTo(10.217, 3);
  });

  it("weight distribution: H1 1030 mm, H2 1058 mm, 50 % → H3 1044 mm; 1046 mm gives back 42.9 %", () => {
    // Source: Ram owner's manuals (2015, 2018, 2023), citing SAE J2807: H1 1030 mm, H2 1058 mm, 50 % → H3 1044 mm
    const { value, unit } = keyFigure("give-the-front-axle-back");
    expect(value).toBeCloseTo(1044, 9);
    expect(unit).toBe("mm");
    // Source: Ram owner's manuals, citing SAE J2807: (1058 − 1046) ÷ (1058 − 1030) = 42.86 %
    expect(keyFigure("give-the-front-axle-back", "restoration").value).toBeCloseTo(42.857, 2);
  });

  it("ball mount: receiver 26 in, coupler 20 in → 6 in drop; the 4 in mount is 2 in off level", () => {
    // Source: boating publication how-to; the formula is geometry: 26 − 20 = 6 in drop
    expect(keyFigure("riding-level").value).toBe(6);
    // Physics: geometry, |4 − 6| = 2 in
    expect(keyFigure("riding-level", "level-error").value).toBe(2);
  });

  it("accessory clearance: 10 in high, 30 in behind → 18.43°, under the 21° departure angle", () => {
    // Physics: geometry, atan(10 ÷ 30) = 18.43° (departure angle as in 49 CFR 523.2)
    expect(keyFigure("rack-that-scrapes").value).toBeCloseTo(18.43, 2);
    // Physics: geometry, 30 × tan 21° − 10 = 1.52 in of extra rise
    expect(keyFigure("rack-that-scrapes", "shank-rise-needed").value).toBeCloseTo(1.516, 3);
  });
});

describe("the two families added last", () => {
  it("tongue weight by beam: jack 1 ft from the block and 2 ft from the scale, 250 lb reads as 750 lb", () => {
    // Source: several published how-to guides; WAC 204-70-040(5); the formula is statics: TW = 250 × (12 + 24) ÷ 12 = 750 lb
    expect(keyFigure("weighing-a-heavy-tongue").value).toBe(750);
    // Statics: lever ratio (a + b) ÷ a = (12 + 24) ÷ 12 = 3
    expect(keyFigure("weighing-a-heavy-tongue", "beam-ratio").value).toBe(3);
    const lesson = keyFigure("weighing-a-heavy-tongue").lesson;
    expect(lesson.conclusion.cautions.join(" ")).toMatch(/[Cc]hock/);
  });

  it("trailer's own ratings: 3,400 − 340 = 3,060 lb on one axle rated 3,000 lb is over", () => {
    const { value, lesson } = keyFigure("the-axle-under-the-trailer");
    // Statics: vertical balance of the trailer standing hitched, W_ax = GTW − TW = 3,400 − 340 = 3,060 lb
    expect(value).toBe(3060);
    // Statics: the axle's rating together, 1 × 3,000 = 3,000 lb; 3,000 − 3,060 = −60 lb
    expect(keyFigure("the-axle-under-the-trailer", "trailer-axle-room").value).toBe(-60);
    expect(lesson.conclusion.status).toBe("over");
  });

  it("tyres: two rear tyres of 1,600 lb carry 3,200 lb, under the 3,300 lb rear axle", () => {
    const { value, lesson } = keyFigure("tyres-below-the-axle");
    // Statics: an axle's load shared by its two tyres, 2 × 1,600 = 3,200 lb
    expect(value).toBe(3200);
    // Statics: 3,200 − 3,300 lb weighed hitched = −100 lb
    expect(keyFigure("tyres-below-the-axle", "rear-tyre-room").value).toBe(-100);
    expect(lesson.conclusion.status).toBe("over");
  });

  it("hardware fit: a 3/4 in shank in a 1 in hole leaves 1/4 in, a part to change", () => {
    const { value, lesson } = keyFigure("a-ball-that-rocks");
    // Geometry: 1 − 0.75 = 0.25 in of room round the shank
    expect(value).toBe(0.25);
    // Source: 15 CRR-NY 57.5 Table 1: a 2,800 lb trailer is class 2, smallest ball 2 in; the 2 in ball is 0 in over it
    expect(keyFigure("a-ball-that-rocks", "ball-size-room").value).toBe(0);
    // A part that does not fit is a set-up to change, not a rating exceeded
    expect(lesson.conclusion.status).toBe("adjust");
  });

  it("envelope: GCWR 13,500 − loaded truck 5,950 = 7,550 lb; at 12.5 % the 800 lb tongue limit allows 6,400 lb", () => {
    // Source: GM (Cadillac) owner's manuals (the combination must not exceed GCWR): 13,500 − (3,350 + 2,600) = 7,550 lb
    expect(keyFigure("how-heavy-a-trailer").value).toBe(7550);
    // Physics: payload left = GVWR − weighed vehicle = 7,000 − 5,950 = 1,050 lb
    expect(keyFigure("how-heavy-a-trailer", "payload-room").value).toBe(1050);
    // Statics: rear axle room (4,000 − 2,600) × 145 ÷ (145 + 48) = 1,051.81 lb of tongue weight
    expect(keyFigure("how-heavy-a-trailer", "rear-axle-room").value).toBeCloseTo(1051.81, 2);
    // Arithmetic: at 12.5 % (the middle of the 10–15 % band, GM and Nissan owner's manuals) 800 ÷ 0.125 = 6,400 lb
    const { lesson } = keyFigure("how-heavy-a-trailer");
    expect(lesson.conclusion.message).toContain("6,400 lb");
    expect(lesson.conclusion.message).not.toMatch(/up to 7,550 lb with up to 800 lb/);
  });
});

describe("the library's stories agree with their own figures", () => {
  it("no hitch is rated above its class's ceiling", () => {
    // Source: New York 15 NYCRR 57.3(c) (adopts SAE J684): Class 1 ≤ 2,000 lb, 2 ≤ 3,500 lb, 3 ≤ 5,000 lb, 4 ≤ 10,000 lb
    const ceilingLb: Record<number, number> = { 1: 2000, 2: 3500, 3: 5000, 4: 10000 };
    expect(CLASS_MAX_GTW).toEqual(ceilingLb);
    for (const example of LIBRARY) {
      const h = example.rig.hitch;
      if (!h?.class || !ceilingLb[h.class]) continue;
      // 1 lb = 0.45359237 kg (the international pound)
      const toLb = example.rig.units === "metric" ? 1 / 0.45359237 : 1;
      for (const rating of [h.gtwRating, h.gtwRatingWd]) if (rating !== undefined) expect(rating * toLb, example.slug).toBeLessThanOrEqual(ceilingLb[h.class]!);
    }
  });

  it("each title's items appear in its story", () => {
    expect(libraryExample("family-full-of-payload")!.story).toMatch(/cooler/);
    expect(libraryExample("count-the-tongue-once")!.story).not.toMatch(/heavy-duty/);
  });

  it("notes where a maker would usually require weight distribution", () => {
    // Common practice, no published source: most makers require weight distribution above about 5,000 lb
    for (const slug of ["count-the-tongue-once", "tongue-load-on-the-axles", "how-heavy-a-trailer"]) {
      const e = libraryExample(slug)!;
      expect(`${e.story} ${e.rule}`, slug).toMatch(/require(s)? (it|weight distribution)|would usually require/);
    }
  });

  it("teaches no wrong reflex: a class is a ceiling, the departure angle is a definition, the front axle is lightened", () => {
    const text = LIBRARY.map((e) => `${e.title} ${e.story} ${e.rule}`).join(" ");
    expect(text).not.toMatch(/is rated for a gross trailer weight up to/);
    expect(text).not.toMatch(/front axle is lifted/);
    expect(text).not.toMatch(/must not cut into the vehicle's departure angle \(49 CFR 523\.2\)/);
    expect(libraryExample("rack-that-scrapes")!.rule).toMatch(/523\.2 defines the departure angle/);
    expect(libraryExample("rack-that-scrapes")!.rule).toMatch(/lowers the rack maker's rating/);
  });
});

describe("marking a whole attempt", () => {
  const example = libraryExample("tongue-load-on-the-axles")!;
  const steps = prepareLesson(example, example.rig)!.steps;

  it("counts right answers and keeps each answer with its step", () => {
    const marked = markAttempt(steps, { "front-change": "-276", "rear-change": "1,076", "front-hitched": "2824", "rear-hitched": "3400" });
    expect(marked).toMatchObject({ ok: true, correct: 3, total: 4 });
  });

  it("refuses an attempt with an empty or unreadable answer, naming the step", () => {
    const marked = markAttempt(steps, { "front-change": "", "rear-change": "lots" });
    expect(marked.ok).toBe(false);
    expect(!marked.ok && Object.keys(marked.fieldErrors).sort()).toEqual(["answers.front-change", "answers.front-hitched", "answers.rear-change", "answers.rear-hitched"]);
  });
});
