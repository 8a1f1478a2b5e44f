/** Plain text with its web addresses made into links (the mail's text part, as a person would read it). */
export function LinkifiedText({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"]+)/g);
  return (
    <pre className="font-mono text-sm leading-relaxed break-words whitespace-pre-wrap text-ink">
      {parts.map((part, index) =>
        /^https?:\/\//.test(part) ? (
          <a key={index} href={part} className="text-accent underline">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </pre>
  );
}
