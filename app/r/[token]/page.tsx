import type { Metadata } from "next";
import { notFound } from "next/navigation";
import QRCode from "qrcode";
import { HandOverConfirmation } from "@/components/installations/hand-over-confirmation";
import { HandOverSheet } from "@/components/installations/hand-over-sheet";
import { ResultReport } from "@/components/report/result-report";
import { handOverByToken } from "@/lib/server/installations";
import { localise } from "@/lib/towing/rules/glossary";
import { resolveShareToken, shareUrl } from "@/lib/server/share-links";

export const metadata: Metadata = {
  title: "Your towing check",
  robots: { index: false, follow: false, nocache: true },
  referrer: "no-referrer",
};
export const dynamic = "force-dynamic";

/**
 * The customer's page, read-only and without an account: a saved check's result, or a fitted hitch's
 * hand-over. A revoked, expired or unknown link renders the not-found page (404) and shows no data.
 */
export default async function SharedResultPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const share = await resolveShareToken(token);
  const url = shareUrl(token);
  if (share.status === "ok") {
    const qrSvg = await QRCode.toString(url, { type: "svg", margin: 0, errorCorrectionLevel: "M" });
    return (
      <main className="mx-auto w-full max-w-3xl px-4 py-6 sm:px-6 sm:py-10 print:max-w-none print:p-0">
        <ResultReport shopName={share.shopName} createdAt={share.createdAt} customerName={share.customerName} rig={share.rig} result={share.result} words={(text) => localise(text, share.result.rules?.glossary ?? "us")} qrSvg={qrSvg} linkUrl={url} />
      </main>
    );
  }
  if (share.reason !== "not-found") notFound();
  const handOver = await handOverByToken(token);
  if (!handOver) notFound();
  const qrSvg = await QRCode.toString(url, { type: "svg", margin: 0, errorCorrectionLevel: "M" });
  return (
    <main className="mx-auto w-full max-w-3xl px-4 py-6 sm:px-6 sm:py-10 print:max-w-none print:p-0">
      <HandOverSheet
        shopName={handOver.shopName}
        record={handOver.record}
        allowance={handOver.allowance}
        measuredBy={handOver.measuredBy}
        qrSvg={qrSvg}
        linkUrl={url}
        confirmation={<HandOverConfirmation token={token} confirmedAt={handOver.record.customerConfirmedAt} />}
      />
    </main>
  );
}
