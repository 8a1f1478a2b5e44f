import type { Metadata } from "next";
import { CheckWorkbench } from "@/components/check/check-workbench";

export const metadata: Metadata = {
  title: "Quick check",
  description: "Check a trailer, rack or carrier against your vehicle's and hitch's ratings. Nothing is saved.",
};

export default async function QuickCheckPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const units = params.units === "metric" ? "metric" : "imperial";
  return (
    <div className="mx-auto max-w-6xl px-4 py-8 sm:px-6">
      <h1 className="text-2xl font-semibold tracking-tight text-ink">Quick check</h1>
      <p className="mt-1.5 max-w-prose text-[0.9375rem] leading-relaxed text-ink-soft">
        Type the figures from the owner&rsquo;s manual, the door-jamb label and the hitch&rsquo;s label. Everything is worked out in your browser and nothing is saved.
      </p>
      <div className="mt-6">
        <CheckWorkbench units={units} signedOut />
      </div>
    </div>
  );
}
