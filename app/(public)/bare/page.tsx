import type { Metadata } from "next";

export const metadata: Metadata = { title: "Blank", robots: { index: false, follow: false } };

/**
 * A page with almost nothing on it, linked from nowhere: the yardstick for the page-weight test (the
 * framework's own first-load JavaScript, against which the customer's page is measured).
 */
export default function BarePage() {
  return <p className="px-4 py-6">Towmargin</p>;
}
