import { Fragment } from 'react';

const URL_PATTERN = /(https?:\/\/[^\s<>"']+)/g;
const TRAILING = /[.,;:!?)\]]+$/;

/** Plain text with its http(s) addresses made into links. Never renders the message's HTML. */
export function LinkifiedText({ text }: { text: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <>
      {parts.map((part, index) => {
        if (index % 2 === 0) return <Fragment key={index}>{part}</Fragment>;
        const trailing = TRAILING.exec(part)?.[0] ?? '';
        const href = trailing ? part.slice(0, -trailing.length) : part;
        return (
          <Fragment key={index}>
            <a href={href} className="break-all text-link underline">
              {href}
            </a>
            {trailing}
          </Fragment>
        );
      })}
    </>
  );
}
