/** A tool's results as a definition list: what, value, unit, and an optional plain-words note. */

export interface ResultItem {
  label: string;
  value: string;
  unit?: string;
  note?: string;
  /** Marks the headline result (Grms, ISO class, exponent) for emphasis and for tests. */
  testId?: string;
}

/** Lists results with units; values are strings so each tool chooses its figures. */
export default function ResultList({ items, title }: { items: ResultItem[]; title: string }) {
  return (
    <section className="card break-inside-avoid" aria-label={title}>
      <h3 className="text-lg font-bold">{title}</h3>
      <dl className="mt-2 grid gap-x-6 gap-y-2 sm:grid-cols-[auto_1fr]">
        {items.map((item) => (
          <div key={item.label} className="contents">
            <dt className="font-semibold text-ink-soft">{item.label}</dt>
            <dd>
              <span className="font-semibold text-ink" data-testid={item.testId}>
                {item.value}
              </span>
              {item.unit && <span className="text-ink-soft"> {item.unit}</span>}
              {item.note && <span className="block text-sm text-ink-soft">{item.note}</span>}
            </dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
