import { Fragment } from "react";

const urlPattern = /(https?:\/\/[^\s<>"]+)/g;

/** Plain text with every http(s) address turned into a link; line breaks are kept by the caller's CSS. */
export function LinkedText({ text }: { text: string }) {
  const parts = text.split(urlPattern);
  return (
    <>
      {parts.map((part, index) =>
        index % 2 === 1 ? (
          <a key={index} href={part} className="break-all text-accent underline underline-offset-2">
            {part}
          </a>
        ) : (
          <Fragment key={index}>{part}</Fragment>
        ),
      )}
    </>
  );
}
