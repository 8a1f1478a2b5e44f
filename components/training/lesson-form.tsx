"use client";
/** Writing or editing a worked example: the text a trainer tells, the check it teaches, and its rig (the check screen's cards). */
import { useRouter } from "next/navigation";
import { useCallback, useEffect } from "react";
import { useActionForm } from "@/components/forms/use-action-form";
import { Button, Field, FormMessage, Select, TextInput, Textarea } from "@/components/ui";
import { LessonRigEditor } from "./lesson-rig-editor";
import { LESSON_FAMILIES } from "@/lib/training/library";
import type { FormState } from "@/lib/validation/form-state";
import { lessonSchema, updateLessonSchema } from "@/lib/validation/training";

export interface LessonFormValues {
  title: string;
  story: string;
  question: string;
  rule: string;
  checkId: string;
  rig: string;
  sourceCheckId?: string;
  lessonId?: string;
}

type Action = (state: FormState, formData: FormData) => Promise<FormState & { id?: string }>;

export function LessonForm({ action, defaults, submitLabel }: { action: Action; defaults: LessonFormValues; submitLabel: string }) {
  const editing = Boolean(defaults.lessonId);
  const { form, state, pending, formAction, onSubmit, errorOf } = useActionForm(editing ? updateLessonSchema : lessonSchema, action as never, defaults as never);
  const router = useRouter();
  const madeId = (state as { id?: string }).id;
  useEffect(() => {
    if (state.ok && madeId) router.push(`/training/lessons/${madeId}`);
  }, [state, madeId, router]);
  const { register, setValue } = form;
  const setRig = useCallback((json: string) => setValue("rig" as never, json as never, { shouldDirty: true }), [setValue]);
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      {defaults.lessonId ? <input type="hidden" {...register("lessonId" as never)} /> : null}
      {defaults.sourceCheckId ? <input type="hidden" {...register("sourceCheckId" as never)} /> : null}
      <Field label="Title" required error={errorOf("title" as never)}>
        <TextInput {...register("title" as never)} />
      </Field>
      <Field label="Story" help="Who they are and what they want to tow or carry. Leave out a customer's real name." required error={errorOf("story" as never)}>
        <Textarea rows={4} {...register("story" as never)} />
      </Field>
      <Field label="Question" help="What the learner should find out." required error={errorOf("question" as never)}>
        <TextInput {...register("question" as never)} />
      </Field>
      <Field label="Check it teaches" required error={errorOf("checkId" as never)}>
        <Select {...register("checkId" as never)}>
          {LESSON_FAMILIES.map((family) => (
            <option key={family.id} value={family.id}>
              {family.label}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="The rule it shows" help="One or two sentences the learner should remember." required error={errorOf("rule" as never)}>
        <Textarea rows={3} {...register("rule" as never)} />
      </Field>
      <section aria-labelledby="lesson-rig-title" className="space-y-2">
        <h2 id="lesson-rig-title" className="text-base font-semibold text-ink">
          The rig
        </h2>
        <p className="text-sm text-ink-soft">The vehicle, the hitch and what is hitched, with the check screen&apos;s own fields. Blank means not known: the lesson then shows what is missing.</p>
        <input type="hidden" {...register("rig" as never)} />
        {errorOf("rig" as never) ? (
          <p role="alert" className="text-sm font-medium text-over">
            {errorOf("rig" as never)}
          </p>
        ) : null}
        <LessonRigEditor initialJson={defaults.rig} onChange={setRig} />
      </section>
      <FormMessage tone={state.ok ? "success" : "error"}>{state.message}</FormMessage>
      <div>
        <Button type="submit" variant="primary" loading={pending}>
          {submitLabel}
        </Button>
      </div>
    </form>
  );
}
