import Link from "next/link";
import { buttonClasses } from "@/components/ui";

const figures = [
  { label: "Every rating against the load", detail: "Vehicle, receiver, ball mount, ball, coupler and chains: the lowest one named." },
  { label: "Margins you can read", detail: "How much is left to each limit, in weight and in percent." },
  { label: "The working shown", detail: "Each number with its formula and the values put in, ready to explain." },
];

export default function LandingPage() {
  return (
    <div className="mx-auto max-w-5xl px-4 py-12 sm:px-6 sm:py-20">
      <p className="text-sm font-semibold tracking-wide text-accent uppercase">For hitch shops, fleets and trainers</p>
      <h1 className="mt-3 max-w-3xl text-4xl leading-[1.1] font-semibold tracking-tight text-balance text-ink sm:text-5xl">
        Does this load fit every rating of this vehicle and this hitch?
      </h1>
      <p className="mt-5 max-w-2xl text-lg leading-relaxed text-ink-soft">
        Towmargin adds up the owner&rsquo;s manual, the door-jamb label and the hitch label the way they should be added: the lowest rating governs,
        tongue weight is counted once, racks clear the fascia and carriers clear the driveway.
      </p>
      <div className="mt-8 flex flex-wrap gap-3">
        <Link href="/sign-in" className={buttonClasses({ variant: "primary" })}>
          Sign in
        </Link>
        <Link href="/sign-up" className={buttonClasses({ variant: "secondary" })}>
          Set up your shop or fleet
        </Link>
        <Link href="/quick-check" className={buttonClasses({ variant: "quiet" })}>
          Try a quick check, no account
        </Link>
      </div>
      <dl className="mt-14 grid gap-4 sm:grid-cols-3">
        {figures.map((figure) => (
          <div key={figure.label} className="rounded-[var(--radius-card)] border border-rule bg-panel p-5 shadow-[var(--shadow-card)]">
            <dt className="font-semibold text-ink">{figure.label}</dt>
            <dd className="mt-1.5 text-[0.9375rem] leading-relaxed text-ink-soft">{figure.detail}</dd>
          </div>
        ))}
      </dl>
      <p className="mt-10 max-w-2xl text-sm leading-relaxed text-ink-soft">
        Got a link from your shop? Open it as it is: result pages need no account.
      </p>
    </div>
  );
}
