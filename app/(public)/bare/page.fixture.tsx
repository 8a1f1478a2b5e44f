import type { Metadata } from "next";

export const metadata: Metadata = { title: "Blank", robots: { index: false, follow: false } };

/**
 * A page with almost nothing on it: the yardstick for the page-weight test (the framework's own first-load
 * JavaScript, against which the customer's and the check page are measured). A test-only page: only a test
 * build (TOWMARGIN_TEST_ROUTES=1, see next.config.ts) routes it; the product's build has no /bare.
 */
export default function BarePage() {
  return <p className="px-4 py-6">Towmargin</p>;
}
