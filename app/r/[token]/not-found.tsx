import { ReportGone } from "@/components/report/report-gone";

export default function SharedResultGone() {
  return (
    <main className="mx-auto w-full max-w-xl px-4 py-16">
      <ReportGone reason="not-found" />
    </main>
  );
}
