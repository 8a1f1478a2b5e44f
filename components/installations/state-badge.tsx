import { CircleCheck, CircleDashed, Wrench } from "lucide-react";
import type { InstallationState } from "@/lib/installations/words";

const LOOK: Record<InstallationState, { words: string; tone: string; Icon: typeof Wrench }> = {
  planned: { words: "Planned", tone: "border-rule text-ink-soft", Icon: CircleDashed },
  fitted: { words: "Fitted", tone: "border-accent/40 text-accent", Icon: Wrench },
  "handed-over": { words: "Handed over", tone: "border-within/40 text-within", Icon: CircleCheck },
};

/** A record's state as a word with an icon, never colour alone. */
export function StateBadge({ state }: { state: InstallationState }) {
  const { words, tone, Icon } = LOOK[state];
  return (
    <span className={`inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-xs font-medium ${tone}`}>
      <Icon aria-hidden="true" className="size-3.5" />
      {words}
    </span>
  );
}
