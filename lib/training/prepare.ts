/**
 * A lesson ready to show: the core evaluates the lesson's rig, the lesson keeps the steps of its own check
 * family, and each step gets its formula in readable pieces and with the numbers put in. Runs on the server
 * (it loads the core and the mathjs parser); what it returns is plain data for the page and the practice screen.
 */
import { evaluateRig, GENERAL_CAUTIONS } from "@/lib/towing";
import type { RigInput } from "@/lib/towing/input";
import type { CheckStatus, Step } from "@/lib/towing/types";
import { markAnswer } from "./answers";
import { markChoice, type ChoiceQuestion, type ChoiceQuestionId } from "./choice-answers";
import { choiceQuestions } from "./questions";
import { formulaParts, substitutedParts, type FormulaPart } from "./formula";

export interface PreparedStep extends Step {
  formulaParts: FormulaPart[];
  substitutedParts: FormulaPart[];
  resultPart: FormulaPart;
}

export interface LessonText {
  title: string;
  story: string;
  question: string;
  checkId: string;
  rule: string;
}

export interface PreparedLesson extends LessonText {
  units: "imperial" | "metric";
  steps: PreparedStep[];
  /** "Which limit governs?" and "What is the next action?", made from the same evaluation. */
  questions: ChoiceQuestion[];
  conclusion: {
    status: CheckStatus;
    title: string;
    message: string;
    advice: string[];
    cautions: string[];
    generalCautions: string[];
  };
}

export function prepareSteps(steps: Step[]): PreparedStep[] {
  return steps.map((step) => ({
    ...step,
    formulaParts: formulaParts(step.formula),
    substitutedParts: substitutedParts(step),
    resultPart: formulaParts(step.result.symbol)[0] ?? { kind: "symbol", base: step.result.symbol },
  }));
}

/** The lesson's check with its steps; null when the rig gives that check no steps (figures missing). */
export function prepareLesson(text: LessonText, rig: RigInput, tightMarginRatio?: number): PreparedLesson | null {
  const result = evaluateRig(rig, tightMarginRatio === undefined ? undefined : { tightMarginRatio });
  const check = result.checks.find((candidate) => candidate.id === text.checkId);
  if (!check || check.steps.length === 0) return null;
  return {
    ...text,
    units: rig.units,
    steps: prepareSteps(check.steps),
    questions: choiceQuestions(result, rig, text.checkId),
    conclusion: {
      status: check.status,
      title: check.title,
      message: check.message,
      advice: check.advice,
      cautions: check.cautions,
      generalCautions: [...(result.verdict.cautions.length ? result.verdict.cautions : GENERAL_CAUTIONS)],
    },
  };
}

/** Why a rig cannot carry a lesson of this family: the fields the check still needs, in words. */
export function lessonGap(rig: RigInput, checkId: string): string | null {
  const result = evaluateRig(rig);
  const check = result.checks.find((candidate) => candidate.id === checkId);
  if (!check) return "This rig has nothing this check applies to (a ball mount needs a trailer, an accessory check an accessory).";
  if (check.steps.length > 0) return null;
  const needs = (check.missing ?? []).map((m) => m.what.toLowerCase());
  return needs.length ? `This rig gives no steps for that check yet: it needs ${needs.join(", ")}.` : "This rig gives no steps for that check yet.";
}

export interface MarkedStep {
  stepId: string;
  answer: string;
  correct: boolean;
}

/** A choice question as kept: the choice's stable id, never its position. */
export interface MarkedChoice {
  questionId: ChoiceQuestionId;
  choiceId: string;
  correct: boolean;
}

export type MarkedAttempt =
  | { ok: true; marked: MarkedStep[]; choices: MarkedChoice[]; correct: number; total: number }
  | { ok: false; fieldErrors: Record<string, string[]> };

/**
 * Marks a whole attempt against the steps and the choice questions; an unreadable or missing answer, a choice
 * that is not one of its question's, or an answer to a question the lesson does not ask is a field error.
 */
export function markAttempt(steps: Step[], answers: Record<string, string>, questions: ChoiceQuestion[] = [], choices: Record<string, string> = {}): MarkedAttempt {
  const fieldErrors: Record<string, string[]> = {};
  const marked: MarkedStep[] = [];
  for (const step of steps) {
    const answer = answers[step.id] ?? "";
    const mark = markAnswer(answer, step.result.value, step.result.unit);
    if (mark.status === "invalid") fieldErrors[`answers.${step.id}`] = [mark.error];
    else marked.push({ stepId: step.id, answer, correct: mark.status === "right" });
  }
  const chosen: MarkedChoice[] = [];
  for (const question of questions) {
    const mark = markChoice(question, choices[question.id]);
    if (mark.status === "invalid") fieldErrors[`choices.${question.id}`] = [mark.error];
    else chosen.push({ questionId: question.id, choiceId: mark.choiceId, correct: mark.status === "right" });
  }
  for (const key of Object.keys(choices))
    if (!questions.some((question) => question.id === key)) fieldErrors[`choices.${key}`] = ["This example asks no such question."];
  if (Object.keys(fieldErrors).length) return { ok: false, fieldErrors };
  const correct = marked.filter((m) => m.correct).length + chosen.filter((m) => m.correct).length;
  return { ok: true, marked, choices: chosen, correct, total: marked.length + chosen.length };
}
