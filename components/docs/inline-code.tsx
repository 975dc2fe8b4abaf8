export interface InlineCodeProps {
  text: string;
}

/** Text with `backticked` spans set in the code face, as the API document's descriptions write them. */
export function InlineCode({ text }: InlineCodeProps) {
  return (
    <>
      {text.split(/(`[^`]+`)/).map((part, index) =>
        part.startsWith("`") && part.endsWith("`") && part.length > 1 ? (
          <code key={index} className="rounded bg-surface-muted px-1 font-mono text-[0.92em]">
            {part.slice(1, -1)}
          </code>
        ) : (
          part
        ),
      )}
    </>
  );
}
