import type { Metadata } from "next";
import { notFound } from "next/navigation";
import QRCode from "qrcode";
import { ResultReport } from "@/components/report/result-report";
import { resolveShareToken, shareUrl } from "@/lib/server/share-links";

export const metadata: Metadata = {
  title: "Your towing check",
  robots: { index: false, follow: false, nocache: true },
  referrer: "no-referrer",
};
export const dynamic = "force-dynamic";

/**
 * The customer's result, read-only and without an account. A revoked, expired or unknown link renders the
 * not-found page (404) and shows no data.
 */
export default async function SharedResultPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const share = await resolveShareToken(token);
  if (share.status !== "ok") notFound();
  const url = shareUrl(token);
  const qrSvg = await QRCode.toString(url, { type: "svg", margin: 0, errorCorrectionLevel: "M" });
  return (
    <main className="mx-auto w-full max-w-3xl px-4 py-6 sm:px-6 sm:py-10 print:max-w-none print:p-0">
      <ResultReport shopName={share.shopName} createdAt={share.createdAt} customerName={share.customerName} rig={share.rig} result={share.result} qrSvg={qrSvg} linkUrl={url} />
    </main>
  );
}
