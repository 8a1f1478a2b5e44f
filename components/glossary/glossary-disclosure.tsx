"use client";

/**
 * The whole glossary folded under one disclosure on the check screen. A link to one of its entries (a worked
 * step's symbol, a "see …") opens it first, so the browser can scroll to the entry.
 */
import { useEffect, useRef, type ReactNode } from "react";

export function GlossaryDisclosure({ title, children }: { title: string; children: ReactNode }) {
  const ref = useRef<HTMLDetailsElement>(null);
  useEffect(() => {
    const onClick = (event: MouseEvent) => {
      const link = (event.target as Element | null)?.closest?.('a[href^="#term-"], a[href^="#sym-"]');
      const details = ref.current;
      if (!link || !details) return;
      const target = document.getElementById(link.getAttribute("href")!.slice(1));
      if (target && details.contains(target) && !details.open) details.open = true;
    };
    document.addEventListener("click", onClick, true);
    return () => document.removeEventListener("click", onClick, true);
  }, []);
  return (
    <details ref={ref} id="glossary" className="group rounded-card border border-rule bg-panel px-4 py-3 sm:px-5">
      <summary className="cursor-pointer text-base font-semibold text-ink select-none">{title}</summary>
      <div className="mt-3">{children}</div>
    </details>
  );
}
