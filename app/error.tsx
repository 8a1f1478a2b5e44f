"use client";
import { Button } from "@/components/ui";

// What a person sees when something on the server failed: no stack, a reference the logs can be searched by.
export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div className="mx-auto max-w-lg px-4 py-20 text-center">
      <h1 className="text-2xl font-semibold tracking-tight text-ink">Something went wrong on our side</h1>
      <p className="mt-3 text-ink-soft">Nothing you typed was lost by this page. Try again; if it keeps happening, tell us the reference below.</p>
      {error.digest ? <p className="num mt-3 font-mono text-sm text-ink-faint">Reference {error.digest}</p> : null}
      <Button className="mt-6" variant="secondary" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
