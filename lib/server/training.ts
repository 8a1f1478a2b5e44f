import "server-only";
import { and, asc, desc, eq, inArray, max, ne, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { courseLessons, courses, lessons, practiceAttempts, savedChecks, users } from "@/db/schema";
import { can, type Permission } from "@/lib/roles";
import type { RigInput } from "@/lib/towing/input";
import { libraryExample } from "@/lib/training/library";
import { lessonGap, markAttempt, prepareLesson, type MarkedChoice, type MarkedStep, type PreparedLesson } from "@/lib/training/prepare";
import type { AttemptInput, LessonInput } from "@/lib/validation/training";
import type { AccessContext } from "./access";
import { absoluteUrl } from "./mail";
import { AccessDenied } from "./access-denied";
import { hashToken, newId, newShareToken } from "./tokens";

export type Visibility = "draft" | "organisation" | "public";

function assertCan(access: AccessContext, permission: Permission) {
  if (!can(access.role, permission)) throw new AccessDenied(permission);
}

export function learnUrl(token: string): string {
  return absoluteUrl(`/learn/${token}`);
}

export type LessonWrite =
  | { ok: true; id: string }
  | { ok: false; message: string; fieldErrors?: Record<string, string[]> };

/** Drafts are for authors; everyone else sees what is published to the organisation or by link. */
function visibleTo(access: AccessContext) {
  const org = eq(lessons.organisationId, access.organisation.id);
  return can(access.role, "training.author") ? org : and(org, ne(lessons.visibility, "draft"));
}

export interface LessonRow {
  id: string;
  title: string;
  checkId: string;
  visibility: Visibility;
  hasPublicLink: boolean;
  updatedAt: string;
  author: string | null;
}

export async function listLessons(access: AccessContext): Promise<LessonRow[]> {
  assertCan(access, "training.practise");
  const db = await getDb();
  const rows = await db
    .select({
      id: lessons.id,
      title: lessons.title,
      checkId: lessons.checkId,
      visibility: lessons.visibility,
      publicTokenHash: lessons.publicTokenHash,
      updatedAt: lessons.updatedAt,
      author: users.name,
    })
    .from(lessons)
    .leftJoin(users, eq(lessons.authorUserId, users.id))
    .where(visibleTo(access))
    .orderBy(desc(lessons.updatedAt), asc(lessons.id));
  return rows.map(({ publicTokenHash, updatedAt, ...row }) => ({ ...row, hasPublicLink: publicTokenHash !== null, updatedAt: updatedAt.toISOString() }));
}

/** One lesson of this organisation that this person may see, or undefined (another organisation's reads as not found). */
export async function getLesson(access: AccessContext, id: string) {
  assertCan(access, "training.practise");
  const db = await getDb();
  const row = await db
    .select()
    .from(lessons)
    .where(and(eq(lessons.id, id), visibleTo(access)))
    .get();
  if (!row) return undefined;
  const { publicTokenHash, ...rest } = row;
  return { ...rest, rig: row.rig as RigInput, hasPublicLink: publicTokenHash !== null };
}

export async function getPreparedLesson(access: AccessContext, id: string): Promise<{ lesson: NonNullable<Awaited<ReturnType<typeof getLesson>>>; prepared: PreparedLesson | null } | undefined> {
  const lesson = await getLesson(access, id);
  if (!lesson) return undefined;
  return { lesson, prepared: prepareLesson(lesson, lesson.rig, access.organisation.tightMarginRatio) };
}

async function sourceCheckOf(access: AccessContext, checkId: string | undefined): Promise<string | null> {
  if (!checkId) return null;
  const db = await getDb();
  const row = await db
    .select({ id: savedChecks.id })
    .from(savedChecks)
    .where(and(eq(savedChecks.id, checkId), eq(savedChecks.organisationId, access.organisation.id)))
    .get();
  return row?.id ?? null;
}

export async function createLesson(access: AccessContext, input: LessonInput): Promise<LessonWrite> {
  assertCan(access, "training.author");
  const gap = lessonGap(input.rig, input.checkId);
  if (gap) return { ok: false, message: "Some fields need attention.", fieldErrors: { checkId: [gap] } };
  const id = newId();
  const db = await getDb();
  await db.insert(lessons).values({
    id,
    organisationId: access.organisation.id,
    authorUserId: access.user.id,
    title: input.title,
    story: input.story,
    question: input.question,
    checkId: input.checkId,
    rule: input.rule,
    rig: input.rig,
    sourceCheckId: await sourceCheckOf(access, input.sourceCheckId),
  });
  return { ok: true, id };
}

export async function updateLesson(access: AccessContext, id: string, input: Omit<LessonInput, "sourceCheckId">): Promise<LessonWrite> {
  assertCan(access, "training.author");
  const gap = lessonGap(input.rig, input.checkId);
  if (gap) return { ok: false, message: "Some fields need attention.", fieldErrors: { checkId: [gap] } };
  const db = await getDb();
  const updated = await db
    .update(lessons)
    .set({ title: input.title, story: input.story, question: input.question, rule: input.rule, checkId: input.checkId, rig: input.rig, updatedAt: new Date() })
    .where(and(eq(lessons.id, id), eq(lessons.organisationId, access.organisation.id)))
    .returning({ id: lessons.id });
  return updated.length ? { ok: true, id } : { ok: false, message: "That example is not in this organisation." };
}

export async function deleteLesson(access: AccessContext, id: string): Promise<boolean> {
  assertCan(access, "training.author");
  const db = await getDb();
  const deleted = await db
    .delete(lessons)
    .where(and(eq(lessons.id, id), eq(lessons.organisationId, access.organisation.id)))
    .returning({ id: lessons.id });
  return deleted.length === 1;
}

/** A library example copied into this organisation's lessons, as a draft the author can change. */
export async function copyLibraryExample(access: AccessContext, slug: string): Promise<LessonWrite> {
  assertCan(access, "training.author");
  const example = libraryExample(slug);
  if (!example) return { ok: false, message: "There is no such example in the library." };
  const id = newId();
  const db = await getDb();
  await db.insert(lessons).values({
    id,
    organisationId: access.organisation.id,
    authorUserId: access.user.id,
    title: example.title,
    story: example.story,
    question: example.question,
    checkId: example.checkId,
    rule: example.rule,
    rig: example.rig,
  });
  return { ok: true, id };
}

/**
 * Who may see a lesson. Publishing by link makes a fresh token (192 random bits) and returns it once; only its
 * SHA-256 is kept. Any other visibility withdraws the link, so an old link opens nothing.
 */
export async function setLessonVisibility(access: AccessContext, id: string, visibility: Visibility): Promise<{ ok: true; url?: string } | { ok: false; message: string }> {
  assertCan(access, "training.author");
  const token = visibility === "public" ? newShareToken() : null;
  const db = await getDb();
  const updated = await db
    .update(lessons)
    .set({ visibility, publicTokenHash: token ? hashToken(token) : null, updatedAt: new Date() })
    .where(and(eq(lessons.id, id), eq(lessons.organisationId, access.organisation.id)))
    .returning({ id: lessons.id });
  if (!updated.length) return { ok: false, message: "That example is not in this organisation." };
  return token ? { ok: true, url: learnUrl(token) } : { ok: true };
}

/**
 * What a public link opens, with no session: the lesson's own text and rig, nothing else of the organisation
 * (no name, no author, no saved check). An unknown or withdrawn token opens nothing.
 */
export async function resolveLessonToken(token: string) {
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) return undefined;
  const db = await getDb();
  const row = await db
    .select({ title: lessons.title, story: lessons.story, question: lessons.question, checkId: lessons.checkId, rule: lessons.rule, rig: lessons.rig, visibility: lessons.visibility })
    .from(lessons)
    .where(eq(lessons.publicTokenHash, hashToken(token)))
    .get();
  if (!row || row.visibility !== "public") return undefined;
  const { visibility: _visibility, ...lesson } = row;
  return { ...lesson, rig: row.rig as RigInput };
}

// ---------------------------------------------------------------------------------------------------------
// Courses

export interface CourseRow {
  id: string;
  title: string;
  description: string;
  lessonCount: number;
}

export async function listCourses(access: AccessContext): Promise<CourseRow[]> {
  assertCan(access, "training.practise");
  const db = await getDb();
  const rows = await db
    .select({ id: courses.id, title: courses.title, description: courses.description })
    .from(courses)
    .where(eq(courses.organisationId, access.organisation.id))
    .orderBy(asc(courses.createdAt), asc(courses.id));
  if (!rows.length) return [];
  const counts = await db
    .select({ courseId: courseLessons.courseId, n: sql<number>`count(*)` })
    .from(courseLessons)
    .innerJoin(lessons, eq(courseLessons.lessonId, lessons.id))
    .where(and(inArray(courseLessons.courseId, rows.map((r) => r.id)), visibleTo(access)))
    .groupBy(courseLessons.courseId);
  const byCourse = new Map(counts.map((c) => [c.courseId, Number(c.n)]));
  return rows.map((row) => ({ ...row, lessonCount: byCourse.get(row.id) ?? 0 }));
}

export async function getCourse(access: AccessContext, id: string) {
  assertCan(access, "training.practise");
  const db = await getDb();
  const course = await db
    .select({ id: courses.id, title: courses.title, description: courses.description })
    .from(courses)
    .where(and(eq(courses.id, id), eq(courses.organisationId, access.organisation.id)))
    .get();
  if (!course) return undefined;
  const items = await db
    .select({ id: lessons.id, title: lessons.title, checkId: lessons.checkId, visibility: lessons.visibility, position: courseLessons.position })
    .from(courseLessons)
    .innerJoin(lessons, eq(courseLessons.lessonId, lessons.id))
    .where(and(eq(courseLessons.courseId, id), visibleTo(access)))
    .orderBy(asc(courseLessons.position), asc(lessons.title));
  return { ...course, lessons: items };
}

export async function createCourse(access: AccessContext, input: { title: string; description: string }): Promise<string> {
  assertCan(access, "training.author");
  const id = newId();
  const db = await getDb();
  await db.insert(courses).values({ id, organisationId: access.organisation.id, title: input.title, description: input.description, createdByUserId: access.user.id });
  return id;
}

export async function updateCourse(access: AccessContext, id: string, input: { title: string; description: string }): Promise<boolean> {
  assertCan(access, "training.author");
  const db = await getDb();
  const updated = await db
    .update(courses)
    .set({ title: input.title, description: input.description })
    .where(and(eq(courses.id, id), eq(courses.organisationId, access.organisation.id)))
    .returning({ id: courses.id });
  return updated.length === 1;
}

export async function deleteCourse(access: AccessContext, id: string): Promise<boolean> {
  assertCan(access, "training.author");
  const db = await getDb();
  const deleted = await db
    .delete(courses)
    .where(and(eq(courses.id, id), eq(courses.organisationId, access.organisation.id)))
    .returning({ id: courses.id });
  return deleted.length === 1;
}

/** Both the course and the lesson must be this organisation's; a lesson already in the course stays where it is. */
async function ownsBoth(access: AccessContext, courseId: string, lessonId: string) {
  const db = await getDb();
  const [course, lesson] = await Promise.all([
    db.select({ id: courses.id }).from(courses).where(and(eq(courses.id, courseId), eq(courses.organisationId, access.organisation.id))).get(),
    db.select({ id: lessons.id }).from(lessons).where(and(eq(lessons.id, lessonId), eq(lessons.organisationId, access.organisation.id))).get(),
  ]);
  return Boolean(course && lesson);
}

export async function addLessonToCourse(access: AccessContext, courseId: string, lessonId: string): Promise<{ ok: boolean; message: string }> {
  assertCan(access, "training.author");
  if (!(await ownsBoth(access, courseId, lessonId))) return { ok: false, message: "That course or example is not in this organisation." };
  const db = await getDb();
  const last = await db.select({ position: max(courseLessons.position) }).from(courseLessons).where(eq(courseLessons.courseId, courseId)).get();
  const inserted = await db
    .insert(courseLessons)
    .values({ courseId, lessonId, position: (last?.position ?? 0) + 1 })
    .onConflictDoNothing()
    .returning({ lessonId: courseLessons.lessonId });
  return inserted.length ? { ok: true, message: "Added to the course." } : { ok: false, message: "That example is already in the course." };
}

export async function removeLessonFromCourse(access: AccessContext, courseId: string, lessonId: string): Promise<boolean> {
  assertCan(access, "training.author");
  if (!(await ownsBoth(access, courseId, lessonId))) return false;
  const db = await getDb();
  const deleted = await db
    .delete(courseLessons)
    .where(and(eq(courseLessons.courseId, courseId), eq(courseLessons.lessonId, lessonId)))
    .returning({ lessonId: courseLessons.lessonId });
  return deleted.length === 1;
}

/** Swaps the lesson with its neighbour; positions are renumbered 1…n so gaps from removals close. */
export async function moveLessonInCourse(access: AccessContext, courseId: string, lessonId: string, direction: "up" | "down"): Promise<boolean> {
  assertCan(access, "training.author");
  if (!(await ownsBoth(access, courseId, lessonId))) return false;
  const db = await getDb();
  const order = await db
    .select({ lessonId: courseLessons.lessonId })
    .from(courseLessons)
    .where(eq(courseLessons.courseId, courseId))
    .orderBy(asc(courseLessons.position), asc(courseLessons.lessonId));
  const ids = order.map((row) => row.lessonId);
  const at = ids.indexOf(lessonId);
  const to = direction === "up" ? at - 1 : at + 1;
  if (at < 0 || to < 0 || to >= ids.length) return false;
  [ids[at], ids[to]] = [ids[to]!, ids[at]!];
  await db.transaction(async (tx) => {
    for (const [index, id] of ids.entries()) {
      await tx.update(courseLessons).set({ position: index + 1 }).where(and(eq(courseLessons.courseId, courseId), eq(courseLessons.lessonId, id)));
    }
  });
  return true;
}

// ---------------------------------------------------------------------------------------------------------
// Practice

export type AttemptWrite =
  | { ok: true; correct: number; total: number; marked: MarkedStep[]; choices: MarkedChoice[] }
  | { ok: false; message: string; fieldErrors?: Record<string, string[]> };

/** Marks the learner's answers against the core's own steps, here on the server, and keeps the attempt. */
export async function recordAttempt(access: AccessContext, input: AttemptInput): Promise<AttemptWrite> {
  assertCan(access, "training.practise");
  const found = await getPreparedLesson(access, input.lessonId);
  if (!found?.prepared) return { ok: false, message: "That example is not open for practice in this organisation." };
  const marked = markAttempt(found.prepared.steps, input.answers, found.prepared.questions, input.choices);
  if (!marked.ok) return { ok: false, message: "Some answers need attention.", fieldErrors: marked.fieldErrors };
  const db = await getDb();
  await db.insert(practiceAttempts).values({
    id: newId(),
    organisationId: access.organisation.id,
    lessonId: input.lessonId,
    userId: access.user.id,
    // The steps as typed, then each choice question with the chosen id: both count in the score.
    answers: [...marked.marked, ...marked.choices],
    correct: marked.correct,
    total: marked.total,
  });
  return { ok: true, correct: marked.correct, total: marked.total, marked: marked.marked, choices: marked.choices };
}

export interface ResultRow {
  userId: string;
  learner: string;
  lessonId: string;
  lesson: string;
  attempts: number;
  bestCorrect: number;
  latestCorrect: number;
  total: number;
  lastAt: string;
}

/** Per learner, per example: how many attempts, the best and the latest score. Authors only. */
export async function listResults(access: AccessContext, filter: { lessonId?: string; userId?: string } = {}): Promise<ResultRow[]> {
  assertCan(access, "training.author");
  return resultRows(access, filter);
}

/** The same table, for the person asking only. */
export async function listMyResults(access: AccessContext): Promise<ResultRow[]> {
  assertCan(access, "training.practise");
  return resultRows(access, { userId: access.user.id });
}

async function resultRows(access: AccessContext, filter: { lessonId?: string; userId?: string }): Promise<ResultRow[]> {
  const db = await getDb();
  const where = [eq(practiceAttempts.organisationId, access.organisation.id)];
  if (filter.lessonId) where.push(eq(practiceAttempts.lessonId, filter.lessonId));
  if (filter.userId) where.push(eq(practiceAttempts.userId, filter.userId));
  const attempts = await db
    .select({
      userId: practiceAttempts.userId,
      learner: users.name,
      lessonId: practiceAttempts.lessonId,
      lesson: lessons.title,
      correct: practiceAttempts.correct,
      total: practiceAttempts.total,
      createdAt: practiceAttempts.createdAt,
    })
    .from(practiceAttempts)
    .innerJoin(users, eq(practiceAttempts.userId, users.id))
    .innerJoin(lessons, and(eq(practiceAttempts.lessonId, lessons.id), eq(lessons.organisationId, access.organisation.id)))
    .where(and(...where))
    .orderBy(asc(practiceAttempts.createdAt), asc(practiceAttempts.id));
  const rows = new Map<string, ResultRow>();
  for (const attempt of attempts) {
    const key = `${attempt.userId}\u0000${attempt.lessonId}`;
    const row = rows.get(key);
    if (!row) {
      rows.set(key, {
        userId: attempt.userId,
        learner: attempt.learner,
        lessonId: attempt.lessonId,
        lesson: attempt.lesson,
        attempts: 1,
        bestCorrect: attempt.correct,
        latestCorrect: attempt.correct,
        total: attempt.total,
        lastAt: attempt.createdAt.toISOString(),
      });
    } else {
      row.attempts += 1;
      row.bestCorrect = Math.max(row.bestCorrect, attempt.correct);
      row.latestCorrect = attempt.correct;
      row.total = attempt.total;
      row.lastAt = attempt.createdAt.toISOString();
    }
  }
  return [...rows.values()].sort((a, b) => a.learner.localeCompare(b.learner) || a.lesson.localeCompare(b.lesson));
}
