import { useMemo } from 'react';
import type { Piece, Vec2Mm } from '../../lib/geometry/types';
import { LINE_STYLES } from '../../lib/render/line-styles';
import { assemblyStepPieceState, type AssemblyRod, type AssemblyStep } from '../../lib/preview/assembly-steps';
import { buildabilityMm } from '../../lib/geometry/buildability';

interface Props {
  pieces: readonly Piece[];
  /** The rods glued on after the pieces, each at its own step. */
  rods: readonly AssemblyRod[];
  step: AssemblyStep | undefined;
}

const GAP_MM = 8;

/** Flat pieces set out in rows by a simple shelf fill, each shifted so its outline starts at its slot, mm. */
function shelfLayout(pieces: readonly Piece[]) {
  const boxes = pieces.map((p) => {
    const xs = p.outlineMm.map((q) => q[0]),
      ys = p.outlineMm.map((q) => q[1]);
    return {
      piece: p,
      minX: Math.min(...xs),
      maxY: Math.max(...ys),
      w: Math.max(...xs) - Math.min(...xs),
      h: Math.max(...ys) - Math.min(...ys),
    };
  });
  const rowWidth = Math.max(
    ...boxes.map((b) => b.w),
    Math.sqrt(boxes.reduce((s, b) => s + (b.w + GAP_MM) * (b.h + GAP_MM), 0)) * 1.6,
  );
  let x = 0,
    y = 0,
    rowH = 0;
  const placed = boxes.map((b) => {
    if (x > 0 && x + b.w > rowWidth) {
      x = 0;
      y += rowH + GAP_MM;
      rowH = 0;
    }
    // SVG y grows down, flat y grows up: flip about the piece's top edge.
    const at = { ...b, dx: x - b.minX, dy: y + b.maxY };
    x += b.w + GAP_MM;
    rowH = Math.max(rowH, b.h);
    return at;
  });
  return { placed, width: Math.max(...placed.map((p) => p.dx + p.minX + p.w)), height: y + rowH };
}

const path = (pts: readonly Vec2Mm[], dx: number, dy: number) =>
  pts.map(([px, py], i) => `${i ? 'L' : 'M'}${(px + dx).toFixed(2)} ${(dy - py).toFixed(2)}`).join('') + 'Z';

/**
 * What shows instead of the 3D view when WebGL is off: the flat pieces, the current step's in teal, and the
 * rods to cut, the current step's marked.
 */
export default function StillFallback({ pieces, rods, step }: Props) {
  const layout = useMemo(() => (pieces.length > 0 ? shelfLayout(pieces) : null), [pieces]);
  return (
    <div className="flex h-full flex-col gap-2 p-3" data-testid="still-fallback">
      <p className="rounded-lg bg-caution-light p-2 text-sm text-ink">
        This browser cannot show the 3D view (WebGL is off or unavailable). Here are the flat pieces; the steps and tab
        numbers beside them work the same.
      </p>
      {layout && (
        <svg
          viewBox={`${-GAP_MM} ${-GAP_MM} ${layout.width + 2 * GAP_MM} ${layout.height + 2 * GAP_MM}`}
          role="img"
          aria-label="The flat pieces of the kit"
          className="min-h-0 w-full flex-1"
        >
          {layout.placed.map(({ piece, dx, dy }) => (
            <g key={piece.id}>
              <path
                d={path(piece.outlineMm, dx, dy)}
                fill={assemblyStepPieceState(step, piece.id) === 'current' ? '#d6efec' : '#ffffff'}
                stroke={LINE_STYLES.cut.color}
                strokeWidth={LINE_STYLES.cut.widthMm}
              />
              {piece.folds.map((f, i) => (
                <line
                  key={i}
                  x1={f.fromMm[0] + dx}
                  y1={dy - f.fromMm[1]}
                  x2={f.toMm[0] + dx}
                  y2={dy - f.toMm[1]}
                  stroke={LINE_STYLES[f.kind].color}
                  strokeWidth={LINE_STYLES[f.kind].widthMm}
                  strokeDasharray={LINE_STYLES[f.kind].dashMm.join(' ')}
                />
              ))}
            </g>
          ))}
        </svg>
      )}
      {rods.length > 0 && (
        <ul className="text-sm" aria-label="Rods to cut and glue on after the pieces" data-testid="fallback-rods">
          {rods.map((r) => {
            const current = assemblyStepPieceState(step, r.partId) === 'current';
            return (
              <li
                key={r.partId}
                aria-current={current ? 'step' : undefined}
                className={current ? 'rounded bg-fold-light px-2 font-semibold' : 'px-2'}
              >
                {r.label}: {buildabilityMm(r.lengthMm)}
              </li>
            );
          })}
        </ul>
      )}
    </div>
  );
}
