import Link from "next/link";
import { buttonClasses } from "@/components/ui";

export default function NotFound() {
  return (
    <div className="mx-auto max-w-lg px-4 py-20 text-center">
      <p className="num text-sm font-semibold text-ink-soft">404</p>
      <h1 className="mt-2 text-2xl font-semibold tracking-tight text-ink">Nothing here</h1>
      <p className="mt-3 text-ink-soft">The address may be mistyped, or what it pointed to has gone.</p>
      <Link href="/" className={buttonClasses({ variant: "secondary", className: "mt-6" })}>
        Go to the start
      </Link>
    </div>
  );
}
