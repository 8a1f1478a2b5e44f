"use server";
import { revalidatePath } from "next/cache";
import { authorize } from "@/lib/server/access";
import {
  addLessonToCourse,
  copyLibraryExample,
  createCourse,
  createLesson,
  deleteCourse,
  deleteLesson,
  moveLessonInCourse,
  recordAttempt,
  removeLessonFromCourse,
  setLessonVisibility,
  updateCourse,
  updateLesson,
} from "@/lib/server/training";
import { invalid, type FormState } from "@/lib/validation/form-state";
import {
  attemptSchema,
  copyLibrarySchema,
  courseIdSchema,
  courseLessonSchema,
  courseSchema,
  lessonIdSchema,
  lessonSchema,
  moveCourseLessonSchema,
  updateCourseSchema,
  updateLessonSchema,
  visibilitySchema,
} from "@/lib/validation/training";

/** Every training action answers with this; `id` names what was made, `url` a public link shown once. */
export type TrainingState = FormState & { id?: string; url?: string; correct?: number; total?: number };

const fields = (formData: FormData) => Object.fromEntries(formData);

export async function createLessonAction(_previous: TrainingState, formData: FormData): Promise<TrainingState> {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = lessonSchema.safeParse(fields(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const made = await createLesson(allowed.access, parsed.data);
  if (!made.ok) return { ok: false, message: made.message, fieldErrors: made.fieldErrors };
  revalidatePath("/training");
  return { ok: true, id: made.id, message: "Worked example saved as a draft." };
}

export async function updateLessonAction(_previous: TrainingState, formData: FormData): Promise<TrainingState> {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = updateLessonSchema.safeParse(fields(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const { lessonId, ...input } = parsed.data;
  const saved = await updateLesson(allowed.access, lessonId, input);
  if (!saved.ok) return { ok: false, message: saved.message, fieldErrors: saved.fieldErrors };
  revalidatePath("/training");
  revalidatePath(`/training/lessons/${lessonId}`);
  return { ok: true, id: lessonId, message: "Changes saved." };
}

export async function deleteLessonAction(_previous: TrainingState, formData: FormData): Promise<TrainingState> {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = lessonIdSchema.safeParse(fields(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  if (!(await deleteLesson(allowed.access, parsed.data.lessonId))) return { ok: false, message: "That example is not in this organisation." };
  revalidatePath("/training");
  return { ok: true, message: "Example deleted, with its practice results." };
}

export async function copyLibraryAction(_previous: TrainingState, formData: FormData): Promise<TrainingState> {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = copyLibrarySchema.safeParse(fields(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const made = await copyLibraryExample(allowed.access, parsed.data.slug);
  if (!made.ok) return { ok: false, message: made.message };
  revalidatePath("/training");
  return { ok: true, id: made.id, message: "Copied into your lessons as a draft." };
}

export async function setVisibilityAction(_previous: TrainingState, formData: FormData): Promise<TrainingState> {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = visibilitySchema.safeParse(fields(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const set = await setLessonVisibility(allowed.access, parsed.data.lessonId, parsed.data.visibility);
  if (!set.ok) return { ok: false, message: set.message };
  revalidatePath("/training");
  revalidatePath(`/training/lessons/${parsed.data.lessonId}`);
  const message = {
    draft: "Back to a draft: only authors see it, and any public link is withdrawn.",
    organisation: "Published to your organisation: everyone can practise it. Any public link is withdrawn.",
    public: "Published by link: anyone with the link can read it. Copy it now; it is shown only once.",
  }[parsed.data.visibility];
  return { ok: true, message, url: set.url };
}

export async function createCourseAction(_previous: TrainingState, formData: FormData): Promise<TrainingState> {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = courseSchema.safeParse(fields(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const id = await createCourse(allowed.access, parsed.data);
  revalidatePath("/training");
  return { ok: true, id, message: "Course made. Add examples to it in order." };
}

export async function updateCourseAction(_previous: TrainingState, formData: FormData): Promise<TrainingState> {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = updateCourseSchema.safeParse(fields(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const { courseId, ...input } = parsed.data;
  if (!(await updateCourse(allowed.access, courseId, input))) return { ok: false, message: "That course is not in this organisation." };
  revalidatePath(`/training/courses/${courseId}`);
  return { ok: true, message: "Course saved." };
}

export async function deleteCourseAction(_previous: TrainingState, formData: FormData): Promise<TrainingState> {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = courseIdSchema.safeParse(fields(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  if (!(await deleteCourse(allowed.access, parsed.data.courseId))) return { ok: false, message: "That course is not in this organisation." };
  revalidatePath("/training");
  return { ok: true, message: "Course deleted; its examples stay in your lessons." };
}

export async function addCourseLessonAction(_previous: TrainingState, formData: FormData): Promise<TrainingState> {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = courseLessonSchema.safeParse(fields(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const added = await addLessonToCourse(allowed.access, parsed.data.courseId, parsed.data.lessonId);
  if (added.ok) revalidatePath(`/training/courses/${parsed.data.courseId}`);
  return added;
}

export async function removeCourseLessonAction(_previous: TrainingState, formData: FormData): Promise<TrainingState> {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = courseLessonSchema.safeParse(fields(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  if (!(await removeLessonFromCourse(allowed.access, parsed.data.courseId, parsed.data.lessonId))) return { ok: false, message: "That example is not in the course." };
  revalidatePath(`/training/courses/${parsed.data.courseId}`);
  return { ok: true, message: "Removed from the course." };
}

export async function moveCourseLessonAction(_previous: TrainingState, formData: FormData): Promise<TrainingState> {
  const allowed = await authorize("training.author");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = moveCourseLessonSchema.safeParse(fields(formData));
  if (!parsed.success) return invalid(parsed.error.issues);
  const { courseId, lessonId, direction } = parsed.data;
  if (!(await moveLessonInCourse(allowed.access, courseId, lessonId, direction))) return { ok: false, message: "That example cannot move further." };
  revalidatePath(`/training/courses/${courseId}`);
  return { ok: true, message: direction === "up" ? "Moved up." : "Moved down." };
}

/** Called by the practice screen with the answers as typed and the choices made; the server marks them again before keeping them. */
export async function submitAttemptAction(input: unknown): Promise<TrainingState> {
  const allowed = await authorize("training.practise");
  if (!allowed.ok) return { ok: false, message: allowed.message };
  const parsed = attemptSchema.safeParse(input);
  if (!parsed.success) return invalid(parsed.error.issues);
  const recorded = await recordAttempt(allowed.access, parsed.data);
  if (!recorded.ok) return { ok: false, message: recorded.message, fieldErrors: recorded.fieldErrors };
  revalidatePath("/training");
  revalidatePath("/training/results");
  return { ok: true, correct: recorded.correct, total: recorded.total, message: `Recorded: ${recorded.correct} of ${recorded.total} answers right.` };
}
