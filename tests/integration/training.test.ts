import { beforeAll, describe, expect, it, vi } from "vitest";

vi.hoisted(() => {
  process.env.DATABASE_URL = `file:${process.env.TMPDIR ?? "/tmp"}/towmargin-training-${process.pid}-${Date.now()}.db`;
  process.env.SMTP_PORT = "9";
});
vi.mock("next/headers", async () => (await import("./support/next-mocks")).headersMock);
vi.mock("next/navigation", async () => (await import("./support/next-mocks")).navigationMock);
vi.mock("next/cache", async () => (await import("./support/next-mocks")).cacheMock);

import {
  addCourseLessonAction,
  copyLibraryAction,
  createCourseAction,
  createLessonAction,
  deleteCourseAction,
  deleteLessonAction,
  moveCourseLessonAction,
  removeCourseLessonAction,
  setVisibilityAction,
  submitAttemptAction,
  updateCourseAction,
  updateLessonAction,
  type TrainingState,
} from "@/app/(workspace)/training/actions";
import { GET as libraryRoute } from "@/app/api/v1/training/library/route";
import { GET as lessonRoute } from "@/app/api/v1/training/lessons/[id]/route";
import { GET as lessonsRoute } from "@/app/api/v1/training/lessons/route";
import { GET as resultsRoute } from "@/app/api/v1/training/results/route";
import { getDb } from "@/db/client";
import { courseLessons, courses, lessons, practiceAttempts } from "@/db/schema";
import { resolveLessonToken } from "@/lib/server/training";
import { libraryExample } from "@/lib/training/library";
import { actAs, buildFixture, form, type Person } from "./support/fixture";

const initial: TrainingState = { ok: false };
const axles = libraryExample("tongue-load-on-the-axles")!;

/** The training tables, all of them or only organisation A's rows. */
async function trainingTables(onlyA = false) {
  const db = await getDb();
  const ofA = <T extends { organisationId: string }>(rows: T[]) => (onlyA ? rows.filter((row) => row.organisationId === "org-a") : rows);
  const aCourses = ofA(await db.select().from(courses).orderBy(courses.id));
  const links = await db.select().from(courseLessons).orderBy(courseLessons.courseId, courseLessons.lessonId);
  return JSON.stringify({
    lessons: ofA(await db.select().from(lessons).orderBy(lessons.id)),
    courses: aCourses,
    courseLessons: onlyA ? links.filter((link) => aCourses.some((c) => c.id === link.courseId)) : links,
    attempts: ofA(await db.select().from(practiceAttempts).orderBy(practiceAttempts.id)),
  });
}

const lessonForm = (extra: Record<string, string> = {}) =>
  form({ title: axles.title, story: axles.story, question: axles.question, rule: axles.rule, checkId: axles.checkId, rig: JSON.stringify(axles.rig), ...extra });

const rightAnswers = { "front-change": "-275.86", "rear-change": "1,076", "front-hitched": "2824", "rear-hitched": "3675.9" };
// Statics: rear 2,600 + 1,075.86 = 3,675.9 lb of the 4,000 lb rear GAWR (8.1 % left); front 3,100 − 275.86 = 2,824.1 lb
// of 3,700 lb (23.7 % left). The rear GAWR governs; 8.1 % is under the organisation's 10 % threshold: tight, so
// the rig tows as set up, with care.
const rightChoices = { governs: "vehicle.gawrRear", "next-action": "tow-with-care" };

let lessonA = "";
let draftA = "";
let courseA = "";
let publicToken = "";

beforeAll(async () => {
  await buildFixture();
  await actAs("trainerA");
  const made = await createLessonAction(initial, lessonForm());
  expect(made).toMatchObject({ ok: true });
  lessonA = made.id!;
  const copied = await copyLibraryAction(initial, form({ slug: "riding-level" }));
  expect(copied.ok).toBe(true);
  draftA = copied.id!;
  expect((await setVisibilityAction(initial, form({ lessonId: lessonA, visibility: "organisation" }))).ok).toBe(true);
  const course = await createCourseAction(initial, form({ title: "Counter basics", description: "" }));
  courseA = course.id!;
  expect((await addCourseLessonAction(initial, form({ courseId: courseA, lessonId: lessonA }))).ok).toBe(true);
  expect((await addCourseLessonAction(initial, form({ courseId: courseA, lessonId: draftA }))).ok).toBe(true);
});

describe("authoring", () => {
  it("refuses bad input field by field and writes nothing", async () => {
    await actAs("trainerA");
    const before = await trainingTables();
    const state = await createLessonAction(initial, lessonForm({ title: " ", checkId: "nonsense", rig: "{not json" }));
    expect(state.ok).toBe(false);
    expect(Object.keys(state.fieldErrors ?? {}).sort()).toEqual(["checkId", "rig", "title"]);
    const badRig = await createLessonAction(initial, lessonForm({ rig: JSON.stringify({ ...axles.rig, vehicle: { ...axles.rig.vehicle, wheelbase: -3 } }) }));
    expect(badRig.fieldErrors?.rig?.[0]).toMatch(/^vehicle\.wheelbase: Wheelbase must be at least/);
    // A rig that gives the chosen check no steps is refused on the check field, naming what it needs.
    const noSteps = await createLessonAction(initial, lessonForm({ checkId: "weight-distribution" }));
    expect(noSteps.fieldErrors?.checkId?.[0]).toMatch(/no steps|nothing this check/);
    expect(await trainingTables()).toBe(before);
  });

  it("edits the text and keeps the lesson in its organisation", async () => {
    await actAs("ownerA");
    const saved = await updateLessonAction(initial, lessonForm({ lessonId: lessonA, title: "Where the tongue load goes" }));
    expect(saved.ok).toBe(true);
    const response = await lessonRoute(new Request("http://t/"), { params: Promise.resolve({ id: lessonA }) });
    const body = (await response.json()) as { lesson: { title: string }; steps: Array<{ id: string; result: { value: number } }> };
    expect(body.lesson.title).toBe("Where the tongue load goes");
    // Physics: statics, 800 × (145 + 50) ÷ 145 = 1,075.86 lb
    expect(body.steps.find((s) => s.id === "rear-change")!.result.value).toBeCloseTo(1075.86, 2);
  });

  it("reorders a course and keeps positions 1…n", async () => {
    await actAs("trainerA");
    expect((await moveCourseLessonAction(initial, form({ courseId: courseA, lessonId: draftA, direction: "up" }))).ok).toBe(true);
    const db = await getDb();
    const order = (await db.select().from(courseLessons)).sort((a, b) => a.position - b.position).map((row) => row.lessonId);
    expect(order).toEqual([draftA, lessonA]);
    expect((await moveCourseLessonAction(initial, form({ courseId: courseA, lessonId: draftA, direction: "up" }))).ok).toBe(false);
    expect((await addCourseLessonAction(initial, form({ courseId: courseA, lessonId: lessonA }))).ok).toBe(false);
  });
});

describe("publishing by link", () => {
  it("opens the lesson's own text only, and a new visibility withdraws the link", async () => {
    await actAs("trainerA");
    const published = await setVisibilityAction(initial, form({ lessonId: draftA, visibility: "public" }));
    expect(published.url).toMatch(/\/learn\/[A-Za-z0-9_-]{32}$/);
    publicToken = published.url!.split("/learn/")[1]!;
    const db = await getDb();
    const row = (await db.select().from(lessons)).find((l) => l.id === draftA)!;
    expect(row.publicTokenHash).not.toContain(publicToken);
    const opened = await resolveLessonToken(publicToken);
    expect(Object.keys(opened!).sort()).toEqual(["checkId", "question", "rig", "rule", "story", "title"]);
    expect(JSON.stringify(opened)).not.toContain("Alder Lane");
    expect(await resolveLessonToken("x".repeat(32))).toBeUndefined();
    // A second link replaces the first.
    const again = await setVisibilityAction(initial, form({ lessonId: draftA, visibility: "public" }));
    expect(await resolveLessonToken(publicToken)).toBeUndefined();
    publicToken = again.url!.split("/learn/")[1]!;
    expect(await resolveLessonToken(publicToken)).toBeDefined();
  });
});

describe("practice", () => {
  it("marks on the server, keeps the attempt, and shows it to the trainer per learner and example", async () => {
    await actAs("staffA");
    const state = await submitAttemptAction({ lessonId: lessonA, answers: { ...rightAnswers, "rear-hitched": "3400" }, choices: rightChoices });
    expect(state).toMatchObject({ ok: true, correct: 5, total: 6 });
    expect((await submitAttemptAction({ lessonId: lessonA, answers: rightAnswers, choices: rightChoices })).correct).toBe(6);
    await actAs("trainerA");
    const body = (await (await resultsRoute(new Request("http://t/api/v1/training/results"))).json()) as { rows: Array<{ learner: string; attempts: number; bestCorrect: number; latestCorrect: number; total: number }> };
    expect(body.rows).toEqual([expect.objectContaining({ learner: "staffA", attempts: 2, bestCorrect: 6, latestCorrect: 6, total: 6 })]);
    expect((await resultsRoute(new Request("http://t/api/v1/training/results?lessonId=bad id"))).status).toBe(400);
  });

  it("marks the choices again on the server: a tampered right answer is marked wrong, and the choice is kept", async () => {
    await actAs("staffA");
    const db = await getDb();
    const before = (await db.select().from(practiceAttempts)).length;
    // The browser says the front GAWR governs and claims a full score; the server marks against the core.
    const state = await submitAttemptAction({ lessonId: lessonA, answers: rightAnswers, choices: { ...rightChoices, governs: "vehicle.gawrFront" }, correct: 6, total: 6 });
    expect(state).toMatchObject({ ok: true, correct: 5, total: 6 });
    const rows = await db.select().from(practiceAttempts);
    expect(rows).toHaveLength(before + 1);
    const kept = rows.find((row) => row.correct === 5 && JSON.stringify(row.answers).includes("vehicle.gawrFront"))!;
    expect(kept.answers).toEqual(
      expect.arrayContaining([
        { questionId: "governs", choiceId: "vehicle.gawrFront", correct: false },
        { questionId: "next-action", choiceId: "tow-with-care", correct: true },
      ]),
    );
  });

  it("refuses an unknown choice id or an unanswered question with a clear field error, and keeps nothing", async () => {
    await actAs("staffA");
    const before = await trainingTables();
    const unknown = await submitAttemptAction({ lessonId: lessonA, answers: rightAnswers, choices: { ...rightChoices, governs: "vehicle.madeUpRating" } });
    expect(unknown).toMatchObject({ ok: false, fieldErrors: { "choices.governs": ["That answer is not one of the choices for this question."] } });
    const unanswered = await submitAttemptAction({ lessonId: lessonA, answers: rightAnswers });
    expect(unanswered.fieldErrors).toEqual({ "choices.governs": ["Choose one of the answers."], "choices.next-action": ["Choose one of the answers."] });
    const stranger = await submitAttemptAction({ lessonId: lessonA, answers: rightAnswers, choices: { ...rightChoices, "which-colour": "red" } });
    expect(stranger.fieldErrors).toEqual({ "choices.which-colour": ["This example asks no such question."] });
    const garbled = await submitAttemptAction({ lessonId: lessonA, answers: rightAnswers, choices: { ...rightChoices, governs: "<b>1</b>" } });
    expect(garbled.fieldErrors?.["choices.governs"]).toEqual(["That answer is not one of the choices for this question."]);
    expect(await trainingTables()).toBe(before);
  });

  it("refuses an empty or unreadable answer per step and keeps nothing", async () => {
    await actAs("staffA");
    const before = await trainingTables();
    const state = await submitAttemptAction({ lessonId: lessonA, answers: { ...rightAnswers, "front-change": "", "rear-change": "1075,86" }, choices: rightChoices });
    expect(state.ok).toBe(false);
    expect(Object.keys(state.fieldErrors ?? {}).sort()).toEqual(["answers.front-change", "answers.rear-change"]);
    expect((await submitAttemptAction("not an object")).ok).toBe(false);
    expect(await trainingTables()).toBe(before);
  });

  it("a learner sees published examples, never a draft", async () => {
    await actAs("trainerA");
    const fresh = await copyLibraryAction(initial, form({ slug: "count-the-tongue-once" }));
    await actAs("staffA");
    const list = (await (await lessonsRoute()).json()) as { lessons: Array<{ id: string }> };
    expect(list.lessons.map((l) => l.id)).not.toContain(fresh.id);
    expect((await lessonRoute(new Request("http://t/"), { params: Promise.resolve({ id: fresh.id! }) })).status).toBe(404);
    const before = await trainingTables();
    expect((await submitAttemptAction({ lessonId: fresh.id, answers: {} })).ok).toBe(false);
    expect(await trainingTables()).toBe(before);
  });
});

describe("who may do what", () => {
  const authorActions = (ids: { lesson: string; course: string }): Array<[string, () => Promise<TrainingState>]> => [
    ["create a lesson", () => createLessonAction(initial, lessonForm())],
    ["edit a lesson", () => updateLessonAction(initial, lessonForm({ lessonId: ids.lesson, title: "Taken over" }))],
    ["delete a lesson", () => deleteLessonAction(initial, form({ lessonId: ids.lesson }))],
    ["copy from the library", () => copyLibraryAction(initial, form({ slug: "riding-level" }))],
    ["publish", () => setVisibilityAction(initial, form({ lessonId: ids.lesson, visibility: "public" }))],
    ["make a course", () => createCourseAction(initial, form({ title: "Mine now" }))],
    ["edit a course", () => updateCourseAction(initial, form({ courseId: ids.course, title: "Mine now" }))],
    ["delete a course", () => deleteCourseAction(initial, form({ courseId: ids.course }))],
    ["add to a course", () => addCourseLessonAction(initial, form({ courseId: ids.course, lessonId: ids.lesson }))],
    ["move in a course", () => moveCourseLessonAction(initial, form({ courseId: ids.course, lessonId: ids.lesson, direction: "down" }))],
    ["remove from a course", () => removeCourseLessonAction(initial, form({ courseId: ids.course, lessonId: ids.lesson }))],
  ];

  const refused: Array<Person | "anonymous"> = ["anonymous", "staffA", "fleetA", "ownerB"];
  for (const actor of refused) {
    it(`${actor} can author nothing in A, and nothing is written`, async () => {
      await actAs(actor);
      const before = await trainingTables(actor === "ownerB");
      for (const [name, run] of authorActions({ lesson: lessonA, course: courseA })) {
        const state = await run();
        if (actor === "ownerB" && (name === "create a lesson" || name === "copy from the library" || name === "make a course")) {
          // B's owner may author in B; that is B's own table space, checked below to stay out of A.
          continue;
        }
        expect(state.ok, `${actor}: ${name}`).toBe(false);
      }
      expect(await trainingTables(actor === "ownerB")).toBe(before);
    });
  }

  it("another organisation's owner cannot practise, read or list A's examples or results", async () => {
    await actAs("ownerB");
    const before = await trainingTables();
    expect((await submitAttemptAction({ lessonId: lessonA, answers: rightAnswers })).ok).toBe(false);
    expect(await trainingTables()).toBe(before);
    expect((await lessonRoute(new Request("http://t/"), { params: Promise.resolve({ id: lessonA }) })).status).toBe(404);
    const list = (await (await lessonsRoute()).json()) as { lessons: Array<{ id: string }>; courses: Array<{ id: string }> };
    expect(list.lessons.map((l) => l.id)).not.toContain(lessonA);
    expect(list.courses.map((c) => c.id)).not.toContain(courseA);
    const results = (await (await resultsRoute(new Request("http://t/api/v1/training/results"))).json()) as { rows: unknown[] };
    expect(results.rows).toEqual([]);
  });

  it("signed out, every route answers 401 and practice writes nothing", async () => {
    await actAs("anonymous");
    const before = await trainingTables();
    expect((await submitAttemptAction({ lessonId: lessonA, answers: rightAnswers })).ok).toBe(false);
    expect(await trainingTables()).toBe(before);
    expect((await lessonsRoute()).status).toBe(401);
    expect((await lessonRoute(new Request("http://t/"), { params: Promise.resolve({ id: lessonA }) })).status).toBe(401);
    expect((await resultsRoute(new Request("http://t/api/v1/training/results"))).status).toBe(401);
    expect((await libraryRoute()).status).toBe(401);
  });

  it("counter staff may read the library and practise but not see results (403)", async () => {
    await actAs("staffA");
    expect((await libraryRoute()).status).toBe(200);
    const refusedResults = await resultsRoute(new Request("http://t/api/v1/training/results"));
    expect(refusedResults.status).toBe(403);
    expect(await refusedResults.text()).not.toMatch(/at .*\.ts/);
  });
});
