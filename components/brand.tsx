import Link from "next/link";
import { cn } from "@/components/ui";

/** The mark: a load bar resting under a limit line, with the margin between them left open. */
export function BrandMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" className={cn("size-7", className)}>
      <rect x="1" y="1" width="30" height="30" rx="7" className="fill-accent" />
      <path d="M7 10.5h18" className="stroke-on-accent" strokeWidth="2.2" strokeLinecap="round" />
      <rect x="7" y="15" width="12.5" height="8.5" rx="1.6" className="fill-on-accent" />
      <path d="M22.5 23.5v-8" className="stroke-on-accent" strokeWidth="1.6" strokeLinecap="round" strokeDasharray="1.6 2.2" />
    </svg>
  );
}

export function BrandLink({ href = "/", className }: { href?: string; className?: string }) {
  return (
    <Link href={href} className={cn("inline-flex items-center gap-2 rounded-md font-semibold tracking-tight text-ink", className)}>
      <BrandMark />
      <span className="text-lg">Towmargin</span>
    </Link>
  );
}
