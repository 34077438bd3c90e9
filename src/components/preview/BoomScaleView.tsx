import type { BoomScale } from '../../lib/preview/boom-scale';
import { lengthLabel } from '../../lib/layout/units';

interface Props {
  boomScale: BoomScale;
}

/**
 * A side view, all to one scale: the model's span at kit scale laid on the floor, a standing person and the
 * length of a classroom floor. Drawn in centimetres (1 user unit = 1 cm).
 */
export default function BoomScaleView({ boomScale: b }: Props) {
  const cm = (mm: number) => mm / 10;
  const [span] = b.footprintMm;
  const room = Math.max(b.classroom.lengthMm, b.classroom.widthMm);
  const person = b.personHeightMm;
  const width = cm(Math.max(room, span + person * 0.6)) + 60;
  const x0 = 30;
  const spanX = x0 + cm(person * 0.5);
  const text = Math.max(12, width / 45);
  // Room above the person for its label, below the floor for the bracket and the classroom label.
  const floor = cm(person) + 1.5 * text;
  const height = floor + 20 + 1.8 * text;
  return (
    <figure className="card">
      <svg
        viewBox={`0 0 ${width} ${height}`}
        role="img"
        aria-labelledby="boom-scale-title"
        className="h-auto w-full"
        data-testid="boom-scale"
      >
        <title id="boom-scale-title">Side view to scale: the model’s span on the floor, a person and a classroom</title>
        <line x1={0} y1={floor} x2={width} y2={floor} stroke="#46505f" strokeWidth={text / 8} />
        {/* the classroom floor, as a bracket below the floor line */}
        <path d={`M${x0} ${floor + 8} v12 h${cm(room)} v-12`} fill="none" stroke="#2b3a67" strokeWidth={text / 6} />
        <text x={x0 + cm(room) / 2} y={floor + 20 + text} textAnchor="middle" fontSize={text} fill="#2b3a67">
          {b.classroom.label}: {lengthLabel(room, 'metric')} long
        </text>
        {/* the person, standing at the left end of the span */}
        <g fill="#6b7482">
          <circle cx={x0 + cm(person * 0.12)} cy={floor - cm(person) + cm(person * 0.065)} r={cm(person * 0.065)} />
          <rect
            x={x0 + cm(person * 0.06)}
            y={floor - cm(person * 0.86)}
            width={cm(person * 0.12)}
            height={cm(person * 0.86)}
            rx={cm(person * 0.04)}
          />
        </g>
        <text x={x0 + cm(person * 0.26)} y={floor - cm(person) + text} fontSize={text} fill="#1b2330">
          person {lengthLabel(person, 'metric')}
        </text>
        {/* the model's span, tip to tip, on the floor */}
        <line
          x1={spanX}
          y1={floor - 6}
          x2={spanX + cm(span)}
          y2={floor - 6}
          stroke="#0d6b62"
          strokeWidth={text / 4}
          strokeLinecap="round"
        />
        <circle cx={spanX + cm(span) / 2} cy={floor - 6} r={Math.max(text / 2, 3)} fill="#0d6b62" />
        <text x={spanX + cm(span) / 2} y={floor - 6 - text} textAnchor="middle" fontSize={text} fill="#084a44">
          model {lengthLabel(span, 'metric')} tip to tip
        </text>
      </svg>
      <figcaption className="mt-2 text-sm">{b.description}</figcaption>
    </figure>
  );
}
