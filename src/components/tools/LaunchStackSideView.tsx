/** A side view of the stack inside the fairing, to scale: each part numbered from the bottom, in stacking order. */
import type { LaunchStackInput, LaunchStackResult } from '../../lib/analysis/launch-stack';

const FILL: Record<string, string> = { adapter: '#d8d2c2', ring: '#f0c36b', probe: '#9fd3cc' };

/** The stack (m) and the fairing outline; parts that stick out are drawn red. */
export default function LaunchStackSideView({ input, result }: { input: LaunchStackInput; result: LaunchStackResult }) {
  const f = input.fairing;
  const R = f.diameterM / 2;
  const top = Math.max(f.cylinderHeightM + f.coneHeightM, result.heightM);
  const half = Math.max(R, result.maxRadiusM) * 1.15;
  const pad = half * 0.08;
  const w = 2 * half;
  const h = top * 1.05 + pad;
  const y = (zM: number) => top * 1.05 - zM;
  const text = Math.max(w, h) / 32;
  // Room on the left for the centre-of-mass label, clear of the stack.
  const labelRoom = text * 8;
  const fairing = `M${-R} ${y(0)} L${-R} ${y(f.cylinderHeightM)} L0 ${y(f.cylinderHeightM + f.coneHeightM)} L${R} ${y(f.cylinderHeightM)} L${R} ${y(0)}`;
  return (
    <figure className="card" data-testid="launch-stack-view">
      <svg
        viewBox={`${-half - labelRoom} ${-pad} ${w + labelRoom} ${h + pad}`}
        role="img"
        aria-labelledby="stack-view-title"
        className="mx-auto h-96 w-auto max-w-full"
      >
        <title id="stack-view-title">
          Side view to scale: the stack inside the fairing, parts numbered from the bottom
        </title>
        <path
          d={fairing}
          fill="none"
          stroke="#2b3a67"
          strokeWidth={text / 5}
          strokeDasharray={`${text / 2} ${text / 3}`}
        />
        <line x1={-half} x2={half} y1={y(0)} y2={y(0)} stroke="#46505f" strokeWidth={text / 6} />
        {result.parts.map((p, i) => (
          <g key={p.label} data-part={p.label}>
            <rect
              x={-p.radiusM}
              y={y(p.topM)}
              width={2 * p.radiusM}
              height={p.topM - p.bottomM}
              fill={p.fits ? FILL[p.role] : '#f4b4ae'}
              stroke={p.fits ? '#46505f' : '#b3261e'}
              strokeWidth={text / 8}
            />
            <text
              x={0}
              y={y((p.bottomM + p.topM) / 2) + text / 3}
              textAnchor="middle"
              fontSize={Math.min(text, (p.topM - p.bottomM) * 0.9)}
              fill="#1b2330"
            >
              {i + 1}
            </text>
          </g>
        ))}
        <line
          x1={-half - labelRoom}
          x2={half}
          y1={y(result.centreOfMassM)}
          y2={y(result.centreOfMassM)}
          stroke="#b3261e"
          strokeWidth={text / 6}
        />
        <text x={-half - labelRoom + text / 3} y={y(result.centreOfMassM) - text / 3} fontSize={text} fill="#b3261e">
          centre of mass
        </text>
      </svg>
      <figcaption className="mt-2 text-sm">
        <ol className="list-decimal pl-5">
          {result.parts.map((p) => (
            <li key={p.label}>
              {p.label}
              {p.fits ? '' : ' (sticks out of the fairing)'}
            </li>
          ))}
        </ol>
        <p className="mt-1 text-ink-soft">Dashed: the fairing. Red line: the stack's centre of mass.</p>
      </figcaption>
    </figure>
  );
}
