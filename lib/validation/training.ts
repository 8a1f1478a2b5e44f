import { z } from "zod";
import { LESSON_FAMILY_IDS } from "@/lib/training/library";
import { rigInputSchema } from "./rig";
import { entityId } from "./checks";

const text = (label: string, max: number) =>
  z
    .string({ error: `${label}: write a few words.` })
    .trim()
    .min(1, `${label}: write a few words.`)
    .max(max, `${label}: use at most ${max} characters.`);

/**
 * The rig of a lesson arrives as JSON text from the form. Its problems are reported on the one field the form
 * has ("rig"), each message naming the rig's own field, e.g. "vehicle.gvwr: GVWR must be at least 1000 lb.".
 */
const rigText = z.string({ error: "Rig: paste the rig as JSON." }).transform((value, ctx) => {
  let data: unknown;
  try {
    data = JSON.parse(value);
  } catch {
    ctx.addIssue({ code: "custom", message: "Rig: this is not valid JSON. Start from a library example or a saved check." });
    return z.NEVER;
  }
  const parsed = rigInputSchema.safeParse(data);
  if (!parsed.success) {
    for (const issue of parsed.error.issues.slice(0, 6)) {
      const where = issue.path.map(String).join(".");
      ctx.addIssue({ code: "custom", message: where ? `${where}: ${issue.message}` : issue.message });
    }
    return z.NEVER;
  }
  return parsed.data;
});

const optionalId = z
  .union([z.literal(""), entityId])
  .optional()
  .transform((value) => (value ? value : undefined));

export const lessonSchema = z.object({
  title: text("Title", 120),
  story: text("Story", 2000),
  question: text("Question", 300),
  rule: text("Rule", 600),
  checkId: z.enum(LESSON_FAMILY_IDS, { error: "Check: choose the family this example teaches." }),
  rig: rigText,
  sourceCheckId: optionalId,
});
export type LessonInput = z.output<typeof lessonSchema>;

export const updateLessonSchema = lessonSchema.omit({ sourceCheckId: true }).extend({ lessonId: entityId });

export const lessonIdSchema = z.object({ lessonId: entityId });

export const LESSON_VISIBILITIES = ["draft", "organisation", "public"] as const;
export const visibilitySchema = z.object({
  lessonId: entityId,
  visibility: z.enum(LESSON_VISIBILITIES, { error: "Choose who may see the example." }),
});

export const copyLibrarySchema = z.object({
  slug: z.string().regex(/^[a-z0-9-]{1,80}$/, "Not a library example."),
});

export const courseSchema = z.object({
  title: text("Title", 120),
  description: z.string().trim().max(1000, "Description: use at most 1000 characters.").default(""),
});

export const updateCourseSchema = courseSchema.extend({ courseId: entityId });
export const courseIdSchema = z.object({ courseId: entityId });
export const courseLessonSchema = z.object({ courseId: entityId, lessonId: entityId });
export const moveCourseLessonSchema = courseLessonSchema.extend({
  direction: z.enum(["up", "down"], { error: "Move up or down." }),
});

const answerText = z.string().max(60, "Keep the answer to a number and a unit.");
export const attemptSchema = z.object({
  lessonId: entityId,
  answers: z.record(z.string().regex(/^[a-z0-9-]{1,60}$/), answerText),
  /** Question id → the chosen choice's id (a rating's id like "hitch.gtwRating", or an action word's id). */
  choices: z
    .record(z.string().regex(/^[a-z0-9-]{1,40}$/, "This example asks no such question."), z.string({ error: "Choose one of the answers." }).regex(/^[A-Za-z0-9.-]{1,80}$/, "That answer is not one of the choices for this question."))
    .optional()
    .default({}),
});
export type AttemptInput = z.output<typeof attemptSchema>;

export const resultsQuerySchema = z.object({
  lessonId: z.union([z.literal(""), entityId]).optional().transform((value) => value || undefined),
  userId: z.union([z.literal(""), entityId]).optional().transform((value) => value || undefined),
});
