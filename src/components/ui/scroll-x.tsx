import { useLayoutEffect, useRef, useState, type ReactNode } from 'react';

/**
 * A box that scrolls sideways when its content (a wide table) is wider than the screen, so the page itself
 * never does. While it scrolls it is a labelled region in the Tab order, so keyboard users can scroll it
 * with the arrow keys; when everything fits it is a plain box and adds no Tab stop. It is positioned, so
 * visually hidden text inside (absolutely placed) stays in the box instead of widening the page.
 */
export function ScrollX({ label, children }: { label: string; children: ReactNode }) {
  const ref = useRef<HTMLDivElement>(null);
  const [scrolls, setScrolls] = useState(false);
  useLayoutEffect(() => {
    const box = ref.current;
    if (!box) return;
    const measure = () => setScrolls(box.scrollWidth > box.clientWidth + 1);
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(box);
    if (box.firstElementChild) observer.observe(box.firstElementChild);
    return () => observer.disconnect();
  }, []);
  return (
    <div
      ref={ref}
      className="relative overflow-x-auto"
      role={scrolls ? 'region' : undefined}
      aria-label={scrolls ? `${label} (scrolls sideways)` : undefined}
      tabIndex={scrolls ? 0 : undefined}
    >
      {children}
    </div>
  );
}
