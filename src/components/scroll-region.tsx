import type { ReactNode } from 'react';

/**
 * A wide table's scroll box that keyboard users can reach and scroll with the arrow keys
 * (WCAG 2.1.1; axe's scrollable-region-focusable), named so screen readers announce it.
 */
export function ScrollRegion({
  label,
  className = 'overflow-x-auto',
  children,
}: {
  label: string;
  className?: string;
  children: ReactNode;
}) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className={className}>
      {children}
    </div>
  );
}
