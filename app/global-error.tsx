"use client";

export default function GlobalError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <html lang="en">
      <body style={{ fontFamily: "system-ui, sans-serif", padding: "4rem 1rem", textAlign: "center", color: "#1c1d1f", background: "#f6f4ef" }}>
        <h1 style={{ fontSize: "1.5rem" }}>Towmargin could not show this page</h1>
        <p>Try again in a moment.{error.digest ? ` Reference ${error.digest}.` : ""}</p>
        <button type="button" onClick={reset} style={{ marginTop: "1rem", padding: "0.6rem 1rem" }}>
          Try again
        </button>
      </body>
    </html>
  );
}
