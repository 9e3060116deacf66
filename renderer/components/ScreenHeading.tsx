import { useEffect, useRef } from 'react';
import type { ReactNode } from 'react';

/** The screen's title; it takes the keyboard focus when the screen opens, so Tab starts from the top of it. */
export function ScreenHeading({ id, children, visuallyHidden }: { id: string; children: ReactNode; visuallyHidden?: boolean }) {
  const ref = useRef<HTMLHeadingElement>(null);
  useEffect(() => { ref.current?.focus({ preventScroll: true }); }, []);
  return <h1 id={id} ref={ref} tabIndex={-1} className={visuallyHidden ? 'sr-only' : 'screen__title'}>{children}</h1>;
}
