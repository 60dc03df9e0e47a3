import { useLayoutEffect, useRef, useState, type ReactNode } from 'react';

interface Edges {
  /** Columns are hidden to the left / to the right of what shows. */
  left: boolean;
  right: boolean;
}

/** Which sides of the box hold content out of sight, kept up to date on scroll and resize. */
function useHiddenEdges() {
  const ref = useRef<HTMLDivElement>(null);
  const [edges, setEdges] = useState<Edges>({ left: false, right: false });
  useLayoutEffect(() => {
    const box = ref.current;
    if (!box) return;
    const update = () => {
      const left = box.scrollLeft > 1;
      const right = box.scrollLeft + box.clientWidth < box.scrollWidth - 1;
      setEdges((e) => (e.left === left && e.right === right ? e : { left, right }));
    };
    update();
    box.addEventListener('scroll', update, { passive: true });
    const observer = new ResizeObserver(update);
    observer.observe(box);
    if (box.firstElementChild) observer.observe(box.firstElementChild);
    return () => {
      box.removeEventListener('scroll', update);
      observer.disconnect();
    };
  }, []);
  return { ref, edges };
}

const shade = 'pointer-events-none absolute inset-y-0 w-8 from-ink-900/20 to-transparent';

/**
 * A wide table's box inside its card: it scrolls sideways itself, so the page never gets wider
 * than the screen. When columns are out of sight it says so above the table and shades the edge
 * they hide behind. Keyboard users reach it and scroll with the arrow keys (WCAG 2.1.1; axe's
 * scrollable-region-focusable); it is named so screen readers announce it.
 */
export function ScrollRegion({
  label,
  className = 'rounded bg-white shadow-sm',
  children,
}: {
  label: string;
  /** The card's look around the scrolling box. */
  className?: string;
  children: ReactNode;
}) {
  const { ref, edges } = useHiddenEdges();
  const hidden = edges.left || edges.right;
  return (
    <div className="min-w-0 space-y-1">
      {hidden && (
        <p className="text-right text-xs font-medium text-ink-500" aria-hidden="true" data-scroll-cue="">
          {edges.left && edges.right
            ? '← More columns on both sides →'
            : edges.right
              ? 'More columns: scroll sideways →'
              : '← More columns to the left'}
        </p>
      )}
      <div className={`relative ${className}`}>
        {/* Positioned, so absolutely placed content inside (screen-reader text) scrolls and clips with it. */}
        <div ref={ref} role="region" aria-label={label} tabIndex={0} className="relative overflow-x-auto rounded">
          {children}
        </div>
        {edges.left && <div aria-hidden="true" className={`${shade} left-0 rounded-l bg-linear-to-r`} />}
        {edges.right && <div aria-hidden="true" className={`${shade} right-0 rounded-r bg-linear-to-l`} />}
      </div>
    </div>
  );
}
