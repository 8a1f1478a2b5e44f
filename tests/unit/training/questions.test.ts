import { describe, expect, it } from "vitest";
import { markChoice } from "@/lib/training/choice-answers";
import { LIBRARY, libraryExample } from "@/lib/training/library";
import { markAttempt, prepareLesson } from "@/lib/training/prepare";
import { MAX_CHOICES, MIN_CHOICES, NEXT_ACTIONS } from "@/lib/training/questions";

const prepared = (slug: string) => {
  const example = libraryExample(slug)!;
  return prepareLesson(example, example.rig)!;
};
const question = (slug: string, id: "governs" | "next-action") => prepared(slug).questions.find((q) => q.id === id)!;

describe("which limit governs", () => {
  it("the weakest-link lesson: the hitch's 5,000 lb rating, against the rig's other rating links", () => {
    // Worked by hand from the rig (4,600 lb trailer, 460 lb tongue):
    //   trailer weight against 7,000 (vehicle), 5,000 (hitch), 6,000 (ball), 6,000 (ball mount), 7,000 (coupler),
    //   6,000 (chains): the lowest is the hitch's 5,000 lb, 400 lb = 8 % of it to spare;
    //   tongue weight against 700 (vehicle), 600 (hitch), 600 (ball mount): 140 lb = 23 % of 600 to spare.
    //   The least room is the hitch's trailer-weight rating: it governs.
    // Source: New York 15 NYCRR 57.3(c) (adopts SAE J684): Class 3 ≤ 5,000 lb; Washington WAC 204-70-060 (the weakest component governs)
    const governs = question("lowest-rating-governs", "governs");
    expect(governs.answerId).toBe("hitch.gtwRating");
    expect(governs.choices.find((c) => c.id === "hitch.gtwRating")).toMatchObject({ label: "Hitch rating", detail: "5,000 lb" });
    // The other choices are the rig's own rating links, by their ids, each once.
    const ids = governs.choices.map((c) => c.id);
    expect(ids).toEqual(expect.arrayContaining(["vehicle.towRating", "ballMount.gtwRating", "trailer.ballRating"]));
    expect(new Set(ids).size).toBe(ids.length);
    expect(governs.choices.length).toBeGreaterThanOrEqual(3);
    expect(governs.choices.length).toBeLessThanOrEqual(5);
    // In a fixed order that does not give the answer away (by label), not answer-first.
    expect(governs.choices.map((c) => c.label)).toEqual([...governs.choices.map((c) => c.label)].sort((a, b) => a.localeCompare(b, "en")));
    expect(governs.why).toContain("Hitch rating is the weakest link, with 400 lb (8 %) to spare.");
  });

  it("the payload lesson: GVWR less curb weight, 6,000 − 4,650 = 1,350 lb", () => {
    // Source: 49 CFR 567.4(g)(3) (GVWR), as the library example cites: payload = GVWR − curb weight
    const governs = question("family-full-of-payload", "governs");
    expect(governs.answerId).toBe("vehicle.gvwr");
    expect(governs.choices.find((c) => c.id === governs.answerId)!.detail).toBe("1,350 lb");
  });

  it("the axle lesson: the rear GAWR, offered beside the front one", () => {
    // Statics: rear 2,600 + 800 × (145 + 50) ÷ 145 = 3,675.9 lb of 4,000 (8.1 % left); front 3,100 − 800 × 50 ÷ 145
    // = 2,824.1 lb of 3,700 (23.7 % left): the rear GAWR governs.
    const governs = question("tongue-load-on-the-axles", "governs");
    expect(governs.answerId).toBe("vehicle.gawrRear");
    expect(governs.choices.map((c) => c.id)).toContain("vehicle.gawrFront");
  });

  it("leaves out a limit with the very same figure as the answer (a tie would make two answers right)", () => {
    // The heavy-tongue rig: vehicle tongue-weight limit 800 lb and hitch tongue rating 800 lb tie.
    const governs = question("weighing-a-heavy-tongue", "governs");
    expect(governs.answerId).toBe("vehicle.tongueWeightLimit");
    expect(governs.choices.map((c) => c.id)).not.toContain("hitch.twRating");
  });
});

describe("what is the next action", () => {
  it("reads the action from the check's status and what it found", () => {
    // Common practice, no published source: the action words; each status as the core defines it (lib/towing/types.ts).
    // over: the payload is 90 lb short (1,440 lb against 1,350 lb) → do not tow
    expect(question("family-full-of-payload", "next-action").answerId).toBe("do-not-tow");
    // over: 13,560 lb against a 13,000 lb GCWR → do not tow
    expect(question("count-the-tongue-once", "next-action").answerId).toBe("do-not-tow");
    // adjust: 270 ÷ 3,000 = 9 % is under the 10 % band → move load forward
    expect(question("too-light-on-the-tongue", "next-action").answerId).toBe("move-load-forward");
    // adjust: a 4 in drop where 26 − 20 = 6 in is needed (geometry) → more drop
    expect(question("riding-level", "next-action").answerId).toBe("more-drop");
    // adjust: (1058 − 1046) ÷ (1058 − 1030) = 42.9 %, short of the 50 % target (SAE J2807 method) → re-set the head
    expect(question("give-the-front-axle-back", "next-action").answerId).toBe("reset-wd");
    // adjust: atan(10 ÷ 30) = 18.4° under the 21° departure angle (geometry) → more shank rise
    expect(question("rack-that-scrapes", "next-action").answerId).toBe("more-rise");
    // tight: 400 lb of 5,000 lb left is 8 %, under the 10 % threshold → tow, with care
    expect(question("lowest-rating-governs", "next-action").answerId).toBe("tow-with-care");
    // within: the beam reads 250 × (12 + 24) ÷ 12 = 750 lb (statics, moments about the block); a weighing exceeds nothing → tow as set up
    expect(question("weighing-a-heavy-tongue", "next-action").answerId).toBe("tow-as-set-up");
    // incomplete: no trailer chosen yet, its weights and the ball's rating unknown → find the missing figures
    expect(question("how-heavy-a-trailer", "next-action").answerId).toBe("find-missing");
  });

  it("draws every choice from the one fixed set of action words, the instructive ones of the family first", () => {
    const known = new Set<string>(NEXT_ACTIONS.map((a) => a.id));
    const ball = question("riding-level", "next-action");
    expect(ball.choices.map((c) => c.id)).toEqual(expect.arrayContaining(["more-drop", "less-drop", "do-not-tow", "tow-as-set-up"]));
    expect(ball.why).toContain("Use a ball mount with a 6 in drop");
    for (const example of LIBRARY) for (const q of prepared(example.slug).questions) for (const c of q.choices) if (q.id === "next-action") expect(known.has(c.id), c.id).toBe(true);
  });
});

describe("every lesson of the library", () => {
  it("asks both questions, with 3–5 choices, the answer among them, ids stable between evaluations", () => {
    for (const example of LIBRARY) {
      const first = prepared(example.slug).questions;
      expect(first.map((q) => q.id), example.slug).toEqual(["governs", "next-action"]);
      for (const q of first) {
        expect(q.choices.length, `${example.slug} ${q.id}`).toBeGreaterThanOrEqual(MIN_CHOICES);
        expect(q.choices.length, `${example.slug} ${q.id}`).toBeLessThanOrEqual(MAX_CHOICES);
        expect(q.choices.map((c) => c.id), example.slug).toContain(q.answerId);
        expect(q.why.length).toBeGreaterThan(20);
      }
      expect(prepared(example.slug).questions).toEqual(first);
    }
  });
});

describe("marking a choice", () => {
  const governs = question("lowest-rating-governs", "governs");

  it("is right for the answer's id, wrong for another choice, and refuses what is not a choice", () => {
    expect(markChoice(governs, "hitch.gtwRating")).toEqual({ status: "right", choiceId: "hitch.gtwRating", answerId: "hitch.gtwRating" });
    expect(markChoice(governs, "vehicle.towRating")).toMatchObject({ status: "wrong" });
    expect(markChoice(governs, undefined)).toEqual({ status: "invalid", error: "Choose one of the answers." });
    expect(markChoice(governs, "0")).toEqual({ status: "invalid", error: "That answer is not one of the choices for this question." });
    expect(markChoice(governs, "vehicle.gvwr")).toMatchObject({ status: "invalid" });
  });

  it("counts the choices in the attempt's score and keeps the chosen ids", () => {
    const lesson = prepared("lowest-rating-governs");
    const answers = Object.fromEntries(lesson.steps.map((s) => [s.id, String(s.result.value)]));
    const marked = markAttempt(lesson.steps, answers, lesson.questions, { governs: "hitch.gtwRating", "next-action": "tow-as-set-up" });
    expect(marked).toMatchObject({ ok: true, correct: lesson.steps.length + 1, total: lesson.steps.length + 2 });
    expect(marked.ok && marked.choices).toEqual([
      { questionId: "governs", choiceId: "hitch.gtwRating", correct: true },
      { questionId: "next-action", choiceId: "tow-as-set-up", correct: false },
    ]);
  });

  it("makes an unknown choice, a missing one or a question the lesson does not ask a field error", () => {
    const lesson = prepared("lowest-rating-governs");
    const answers = Object.fromEntries(lesson.steps.map((s) => [s.id, String(s.result.value)]));
    expect(markAttempt(lesson.steps, answers, lesson.questions, { governs: "hitch.madeUp", extra: "x" })).toEqual({
      ok: false,
      fieldErrors: {
        "choices.governs": ["That answer is not one of the choices for this question."],
        "choices.next-action": ["Choose one of the answers."],
        "choices.extra": ["This example asks no such question."],
      },
    });
  });
});
