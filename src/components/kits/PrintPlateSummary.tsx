import type { KitPrintView } from '../../lib/kit/kit-print';

interface Props {
  print: KitPrintView | { error: string };
}

/** What the STL holds: its scale and why, the parts in gluing order, and what is used instead of a part. */
export default function PrintPlateSummary({ print }: Props) {
  if ('error' in print) return <p className="text-ink-soft">{print.error}</p>;
  return (
    <div data-testid="print-plate" data-scale={print.scaleDenominator}>
      <p>
        {print.bedLabel}, {print.nozzleMm} mm nozzle: {print.explanation}
      </p>
      <ol className="mt-2 list-decimal pl-5">
        {[...print.parts, ...print.substitutes]
          .sort((a, b) => a.step - b.step)
          .map((p) => (
            <li key={`${p.step}-${p.label}`} value={p.step}>
              <strong>{p.label}</strong>
              {'instead' in p
                ? ` — not printed: use ${p.instead}; ${p.attach}.`
                : ` — ${p.sizeMm.join(' × ')} mm, ${p.attach}${p.note ? ` (${p.note})` : ''}.`}
            </li>
          ))}
      </ol>
    </div>
  );
}
