/**
 * Developing a cone or frustum exactly: a circular or annular sector with a seam tab that continues the
 * sector so it rolls under the opposite edge. Flat mm with the (virtual) apex at the origin, the sector
 * centred on +x; model mm at kit scale. Giesecke et al., Technical Drawing, chapter on developments.
 */
import type { CurvedDevelopment, PartKind, Piece, PlaneFrame, Vec2Mm } from './types';
import { pieceFromNet } from './piece-builder';
import { arcPoints } from './paper';
import { curvedDevelopmentPoint, frameApply } from './hinge-tree';
import { EDGE_LABEL_INSET_MM } from './net-glue';

/** Sector of a cone (topRadiusMm = 0) or frustum; null when radii or height are not positive and ordered. */
export function coneDevelopment(
  baseRadiusMm: number,
  topRadiusMm: number,
  heightMm: number,
): Extract<CurvedDevelopment, { kind: 'cone' | 'frustum' }> | null {
  if (!(baseRadiusMm > topRadiusMm && topRadiusMm >= 0 && heightMm > 0) || !Number.isFinite(baseRadiusMm + heightMm))
    return null;
  const slantMm = Math.hypot(baseRadiusMm - topRadiusMm, heightMm);
  const drop = baseRadiusMm - topRadiusMm;
  // Frustum radii s·R/(R − r) and s·r/(R − r); angle 2π·(R − r)/s, which for a cone is 2π·r/L.
  return {
    kind: topRadiusMm === 0 ? 'cone' : 'frustum',
    baseRadiusMm,
    topRadiusMm,
    heightMm,
    outerRadiusMm: (slantMm * baseRadiusMm) / drop,
    innerRadiusMm: (slantMm * topRadiusMm) / drop,
    sectorAngleRad: (2 * Math.PI * drop) / slantMm,
  };
}

export interface ConePieceSpec {
  id: string;
  partId: string;
  partKind: PartKind;
  label: string;
  assemblyStep: number;
  development: Extract<CurvedDevelopment, { kind: 'cone' | 'frustum' }>;
  /** Places the flat plane: origin at the (real or virtual) apex, xAxis × yAxis along the axis toward the wide end. */
  frame: PlaneFrame;
  tabNumber: number;
  tabDepthMm: number;
}

/** The sector piece with its seam tab (the sector continued past one straight edge, short of a full turn). */
export function conePiece(spec: ConePieceSpec): Piece {
  const d = spec.development;
  const half = d.sectorAngleRad / 2;
  const [rIn, rOut] = [d.innerRadiusMm, d.outerRadiusMm];
  // Tab angle: its width at the narrow end (or mid-slant for a cone) is the wanted depth, capped so
  // sector plus tab stays under a full turn.
  const widthAt = rIn > 0 ? rIn : rOut / 2;
  const free = 2 * Math.PI - d.sectorAngleRad;
  const tabRad = Math.min(spec.tabDepthMm / widthAt, 0.9 * free, 0.6);
  const ring = (from: number, to: number): Vec2Mm[] => {
    const outer = arcPoints([0, 0], rOut, from, to);
    const inner = rIn > 0 ? arcPoints([0, 0], rIn, to, from) : [[0, 0] as [number, number]];
    return [...outer, ...inner];
  };
  const face = ring(-half, half);
  const tab = ring(half, half + tabRad);
  const face3 = face.map((p) => frameApply(spec.frame, curvedDevelopmentPoint(d, p, 1)));
  const mid = (rIn + rOut) / 2;
  const piece = pieceFromNet({
    id: spec.id,
    partId: spec.partId,
    partKind: spec.partKind,
    label: spec.label,
    assemblyStep: spec.assemblyStep,
    faces: [{ flatMm: face, modelMm: face3 }],
    joints: [],
    // Depth as cut: across the seam at the narrow end of a frustum; a pointed cone's tab is a wedge that
    // vanishes at the apex, so its depth is taken at the rim, where the seam is pressed.
    tabs: [
      {
        number: spec.tabNumber,
        polygonMm: tab,
        labelAtMm: polar(mid, half + tabRad / 2),
        depthMm: (rIn > 0 ? rIn : rOut) * Math.sin(Math.min(tabRad, Math.PI / 2)),
      },
    ],
    // The opposite straight edge (at −half) receives the tab; its label sits just inside it.
    edgeLabels: [
      {
        number: spec.tabNumber,
        atMm: polar(mid, -half + Math.min(EDGE_LABEL_INSET_MM / mid, half / 4)),
        angleRad: -half,
      },
    ],
    curved: d,
    rootFrame: spec.frame,
  });
  // The polyline loses a little area to its chords; report the exact developed area θ/2·(R² − r²).
  return { ...piece, faceAreaMm2: (d.sectorAngleRad / 2) * (rOut * rOut - rIn * rIn) };
}

const polar = (r: number, a: number): Vec2Mm => [r * Math.cos(a), r * Math.sin(a)];
