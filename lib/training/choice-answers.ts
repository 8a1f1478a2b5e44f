/**
 * A practice question answered by choosing: "Which limit governs?" and "What is the next action?". Pure and light
 * (no core, no mathjs), so the practice screen marks a choice at once and the server marks it again with the same
 * function. Choice ids are stable (a rating's id such as "hitch.gtwRating", or an action word's id), never a
 * position in a list, so an attempt can be marked again against a fresh evaluation.
 */

export type ChoiceQuestionId = "governs" | "next-action";

export interface ChoiceOption {
  id: string;
  label: string;
  /** The figure beside the label, already formatted ("5,000 lb"). */
  detail?: string;
}

export interface ChoiceQuestion {
  id: ChoiceQuestionId;
  title: string;
  prompt: string;
  /** 3–5 choices, in a fixed order that does not give the answer away. */
  choices: ChoiceOption[];
  answerId: string;
  /** Why the answer is right, in the core's own words: shown once the question is marked. */
  why: string;
}

export type ChoiceMark = { status: "right" | "wrong"; choiceId: string; answerId: string } | { status: "invalid"; error: string };

/** Right or wrong, or why the choice could not be read (none made, or not one of this question's choices). */
export function markChoice(question: ChoiceQuestion, choiceId: string | undefined): ChoiceMark {
  if (!choiceId) return { status: "invalid", error: "Choose one of the answers." };
  if (!question.choices.some((choice) => choice.id === choiceId)) return { status: "invalid", error: "That answer is not one of the choices for this question." };
  return { status: choiceId === question.answerId ? "right" : "wrong", choiceId, answerId: question.answerId };
}
