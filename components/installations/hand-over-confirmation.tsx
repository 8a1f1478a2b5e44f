/**
 * The customer's "I have read the limits": a plain form posting to /api/v1/handover/confirm, so it works
 * with no JavaScript at all; the route sends the browser back here. Once confirmed, the time is shown.
 */
import { buttonClasses } from "@/components/ui/button";

export function HandOverConfirmation({ token, confirmedAt }: { token: string; confirmedAt: number | null }) {
  if (confirmedAt) {
    return (
      <p role="status" className="rounded-md border border-within/35 bg-within-soft/60 px-4 py-3 text-sm print:px-2 print:py-1 print:text-[8pt]" data-testid="confirmed">
        You confirmed on{" "}
        <time dateTime={new Date(confirmedAt).toISOString()}>
          {new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short" }).format(new Date(confirmedAt))}
        </time>{" "}
        that you have read these limits. Thank you.
      </p>
    );
  }
  return (
    <form method="post" action="/api/v1/handover/confirm" className="no-print flex flex-col gap-3 rounded-md border border-accent/40 bg-accent-soft/40 px-4 py-3">
      <input type="hidden" name="token" value={token} />
      <label className="flex items-start gap-3 text-sm">
        <input type="checkbox" name="confirm" value="yes" required className="mt-0.5 size-5 shrink-0 accent-accent" />
        <span>I have read what this hitch allows and the cautions above, and I will check my own loads against them.</span>
      </label>
      <div>
        <button type="submit" className={buttonClasses({ variant: "primary" })}>
          Confirm I have read the limits
        </button>
      </div>
    </form>
  );
}
