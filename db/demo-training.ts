/**
 * Demo training for Quillfield Hitch & Trailer: four library examples copied into its lessons and published to
 * the shop, one also by link, ordered into a course for new counter staff, and a few practice attempts by the
 * counter. Invented throughout, like the rest of the demo.
 */
import { randomBytes } from "node:crypto";
import { LIBRARY } from "../lib/training/library";
import { courseLessons, courses, lessons, practiceAttempts } from "./schema";
import type { Database } from "./client";

type Writer = Pick<Database, "insert">;

const newId = () => randomBytes(15).toString("base64url");

const COURSE_SLUGS = ["lowest-rating-governs", "too-light-on-the-tongue", "family-full-of-payload", "tongue-load-on-the-axles"];

export async function seedDemoTraining(tx: Writer, organisationId: string, userIds: Map<string, string>): Promise<void> {
  const trainer = userIds.get("trainer@quillfield.example.com") ?? null;
  const courseId = newId();
  await tx.insert(courses).values({ id: courseId, organisationId, title: "First week at the counter", description: "The four checks every rig gets, in the order they are asked.", createdByUserId: trainer });
  const lessonIds: string[] = [];
  for (const [index, slug] of COURSE_SLUGS.entries()) {
    const example = LIBRARY.find((candidate) => candidate.slug === slug)!;
    const id = newId();
    lessonIds.push(id);
    await tx.insert(lessons).values({
      id,
      organisationId,
      authorUserId: trainer,
      title: example.title,
      story: example.story,
      question: example.question,
      checkId: example.checkId,
      rule: example.rule,
      rig: example.rig,
      visibility: "organisation",
    });
    await tx.insert(courseLessons).values({ courseId, lessonId: id, position: index + 1 });
  }
  // Answers as the counter typed them; the marks agree with the core's steps for these examples.
  const attempts: Array<{ email: string; lesson: number; answers: Array<[string, string, boolean]>; daysAgo: number }> = [
    { email: "counter@quillfield.example.com", lesson: 0, daysAgo: 3, answers: [["lowest-gtw-rating", "7000", false], ["gtw-margin", "400", true], ["lowest-tw-rating", "600", true], ["tw-margin", "140", true]] },
    { email: "counter@quillfield.example.com", lesson: 2, daysAgo: 2, answers: [["payload-capacity", "1350", true], ["payload-used", "990", false], ["payload-margin", "-90", true]] },
    { email: "counter2@quillfield.example.com", lesson: 1, daysAgo: 1, answers: [["tongue-share", "9", true]] },
  ];
  for (const attempt of attempts) {
    const userId = userIds.get(attempt.email);
    if (!userId) continue;
    await tx.insert(practiceAttempts).values({
      id: newId(),
      organisationId,
      lessonId: lessonIds[attempt.lesson]!,
      userId,
      answers: attempt.answers.map(([stepId, answer, correct]) => ({ stepId, answer, correct })),
      correct: attempt.answers.filter(([, , correct]) => correct).length,
      total: attempt.answers.length,
      createdAt: new Date(Date.now() - attempt.daysAgo * 86_400_000),
    });
  }
}
