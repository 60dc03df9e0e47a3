/**
 * "On this page": the plan page is long (figures, charts, the horizon slider, the
 * schedule, cautions, sign-off), so a row of in-page links stays at the top of the
 * window while the reader scrolls. Plain fragment links: the browser scrolls and
 * moves focus, and the back button returns.
 */
export interface PlanSection {
  readonly id: string;
  readonly label: string;
  readonly tone?: 'caution';
}

export function PlanSectionsNav({ sections }: { sections: readonly PlanSection[] }) {
  return (
    <nav
      aria-label="On this page"
      className="sticky top-0 z-10 -mx-2 border-b border-ink-100 bg-ink-50/95 px-2 py-2 backdrop-blur"
    >
      <ul className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
        {sections.map((section) => (
          <li key={section.id}>
            <a
              href={`#${section.id}`}
              className={
                section.tone === 'caution'
                  ? 'font-semibold text-amber-700 underline-offset-2 hover:underline'
                  : 'font-medium text-ink-700 underline-offset-2 hover:text-ink-900 hover:underline'
              }
            >
              {section.label}
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}
