"use client";

/**
 * The customer page's only client piece: a button that opens the browser's print dialog.
 * Kept tiny on purpose (inline icon, no imports) so the page ships almost no JavaScript.
 */
export function PrintButton({ className }: { className?: string }) {
  return (
    <button type="button" onClick={() => window.print()} className={`no-print ${className ?? ""}`}>
      <svg aria-hidden="true" viewBox="0 0 24 24" fill="none" stroke="currentColor" strokeWidth={2} strokeLinecap="round" strokeLinejoin="round">
        <path d="M7 9V3h10v6" />
        <rect x="3" y="9" width="18" height="8" rx="2" />
        <path d="M7 14h10v7H7z" />
      </svg>
      Print
    </button>
  );
}
