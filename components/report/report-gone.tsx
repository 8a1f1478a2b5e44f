/**
 * What a customer sees when a report link no longer works. Shows no data at all: not the shop's, not the
 * rig's, not whether a report ever existed behind the link beyond the reason given.
 */
import { Link2Off } from "lucide-react";

export interface ReportGoneProps {
  reason: "revoked" | "expired" | "not-found";
}

const WORDS: Record<ReportGoneProps["reason"], { title: string; body: string }> = {
  revoked: {
    title: "This report link has been switched off",
    body: "The shop that sent it has withdrawn this link, so the report can no longer be opened here.",
  },
  expired: {
    title: "This report link has expired",
    body: "Report links stay open for a limited time, and this one has run out.",
  },
  "not-found": {
    title: "This link does not lead to a report",
    body: "It may be incomplete or mistyped. Check that the whole link was copied, or open it again from the message the shop sent.",
  },
};

export function ReportGone({ reason }: ReportGoneProps) {
  const words = WORDS[reason];
  return (
    <section aria-labelledby="report-gone-title" className="mx-auto w-full max-w-xl px-4 py-12 sm:px-6" data-reason={reason}>
      <div className="rounded-card border border-rule bg-panel p-6 shadow-card">
        <Link2Off aria-hidden="true" className="size-8 text-ink-faint" strokeWidth={1.75} />
        <h1 id="report-gone-title" className="mt-4 text-xl font-semibold text-ink">
          {words.title}
        </h1>
        <p className="mt-2 text-ink-soft">{words.body}</p>
        <h2 className="mt-6 text-base font-semibold text-ink">What to do</h2>
        <p className="mt-1 text-ink-soft">
          Ask the shop that checked your rig for a new link. Their details are on the message or the printout that
          brought you here.
        </p>
      </div>
    </section>
  );
}
