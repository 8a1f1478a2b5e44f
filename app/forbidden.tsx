import Link from "next/link";
import { buttonClasses } from "@/components/ui";

export default function Forbidden() {
  return (
    <div className="mx-auto max-w-lg px-4 py-20 text-center">
      <p className="num text-sm font-semibold text-ink-soft">403</p>
      <h1 className="mt-2 text-2xl font-semibold tracking-tight text-ink">This page is not part of your role</h1>
      <p className="mt-3 text-ink-soft">Your role in this organisation does not include it. An owner can change roles on the Team page.</p>
      <Link href="/overview" className={buttonClasses({ variant: "secondary", className: "mt-6" })}>
        Back to the overview
      </Link>
    </div>
  );
}
