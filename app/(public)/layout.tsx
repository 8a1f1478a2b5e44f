import { BrandLink } from "@/components/brand";

export default function PublicLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="border-b border-rule bg-panel/60">
        <div className="mx-auto flex h-14 max-w-5xl items-center justify-between px-4 sm:px-6">
          <BrandLink />
        </div>
      </header>
      <main id="main" className="flex-1">{children}</main>
      <footer className="border-t border-rule text-sm text-ink-soft">
        <div className="mx-auto max-w-5xl px-4 py-5 sm:px-6">
          Towmargin does the arithmetic on the figures you give it and does not decide what the law allows; the vehicle maker&rsquo;s and the labels&rsquo; ratings, local law and a qualified installer have the last word.
        </div>
      </footer>
    </div>
  );
}
