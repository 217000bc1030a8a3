// A person's picture from their GitHub profile (in development a data: URI the local fake makes),
// or their initial on a tinted disc when there is none or it does not load.
import { useState } from 'react';

export function Avatar({ src, login, size = 22 }: { src: string; login: string; size?: number }) {
  const [failed, setFailed] = useState<string | null>(null);
  const style = { width: size, height: size };
  if (!src || failed === src) {
    return (
      <span
        aria-hidden="true"
        style={{ ...style, fontSize: Math.round(size * 0.5) }}
        className="inline-grid shrink-0 place-items-center rounded-full bg-accent-soft font-semibold text-accent uppercase"
      >
        {login.slice(0, 1)}
      </span>
    );
  }
  return (
    <img
      src={src}
      alt=""
      width={size}
      height={size}
      style={style}
      referrerPolicy="no-referrer"
      onError={() => setFailed(src)}
      className="shrink-0 rounded-full bg-raised ring-1 ring-line"
    />
  );
}
