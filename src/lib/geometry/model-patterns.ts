/**
 * The flat patterns of a whole model at a scale on a paper weight for a grade band: the body net first
 * (step 1), then one step per appendage in the model's order, tab numbers unique across the kit, the wire
 * boom threads, and the substitutes for parts too fine for paper (part-substitutes.ts): a boom thinner than
 * a pencil has no piece but a rod cut to length; a cone smaller than the band can roll is a flat disc. A
 * launch stack's parts come from launch-stack.ts.
 * Flat mm per piece, model mm at kit scale (see types.ts).
 */
import { z } from 'zod';
import type { Model } from './model-schema';
import type { Piece, PlaneFrame, Vec3Mm, WireBoomThread } from './types';
import { bodyNet } from './body-net';
import { appendageDirection, appendageFootMm, frameAlongAxis, frameAroundAxis } from './appendage-frame';
import { coneDevelopment, conePiece } from './cone-development';
import { tubePiece } from './tube-pattern';
import { deployablePanelFrame, panelBodyLabel, panelPiece } from './panel-pattern';
import { WIRE_ANCHOR_SIZE_MM, wireAnchorPiece, wireAnchorPlacement, wireBoomThread } from './wire-boom';
import { arcPoints, paperOverlapMm, paperTabDepthMm } from './paper';
import { PaperGsmSchema, ScaleDenominatorSchema } from './pattern-option-schemas';
import { BUILD_GRADE_BAND_DEFAULT, BUILD_GRADE_BANDS, BUILDABILITY_MINIMUMS } from './buildability';
import { boomStockFor, coneTooSmall, type PartSubstitute } from './part-substitutes';
import { pieceFromNet } from './piece-builder';
import { frameApply } from './hinge-tree';
import { vec3Combine } from './vec';
import { launchStackPieces } from './launch-stack';
import { meshShapeUnfold } from '../mesh/mesh-model';

export const PatternOptionsSchema = z.object({
  /** The kit is 1:scaleDenominator of the real model. */
  scaleDenominator: ScaleDenominatorSchema,
  paperGsm: PaperGsmSchema,
  /** The class the kit is for: sets anchor sizes and which parts are too fine for paper. */
  gradeBand: z.enum(BUILD_GRADE_BANDS).default(BUILD_GRADE_BAND_DEFAULT),
  /** The largest piece the sheet takes, mm: an imported mesh is cut along folds to fit it (parametric pieces are cut by the packer). */
  pieceMaxMm: z.object({ widthMm: z.number().positive(), heightMm: z.number().positive() }).optional(),
});
export type PatternOptions = z.input<typeof PatternOptionsSchema>;

export interface ModelPatterns {
  pieces: Piece[];
  threads: WireBoomThread[];
  /** Parts swapped for something a class can build, in the model's order. */
  substitutes: PartSubstitute[];
}

/** Every piece and thread of a parsed model at options.scaleDenominator on options.paperGsm paper. */
export function modelPatterns(model: Model, options: PatternOptions): ModelPatterns {
  const { scaleDenominator: N, paperGsm: gsm } = options;
  const band = options.gradeBand ?? BUILD_GRADE_BAND_DEFAULT;
  if (model.mesh) {
    const { pieces } = meshShapeUnfold(model.mesh, {
      scaleDenominator: N,
      paperGsm: gsm,
      pieceMaxMm: options.pieceMaxMm,
      name: model.name,
    });
    return { pieces, threads: [], substitutes: [] };
  }
  if (model.stack) return { pieces: launchStackPieces(model, N, gsm, band), threads: [], substitutes: [] };
  const k = 1000 / N;
  const substitutes: PartSubstitute[] = [];
  let number = 0;
  const next = () => ++number;
  const body = bodyNet(model.body, N, gsm, band, next, 1);
  const pieces: Piece[] = [...body.pieces];
  // Marks for parts glued onto a body face go on whichever body piece holds that face.
  const markFace = (ref: string, pointMm: Vec3Mm, num: number) => {
    const spot = body.faceSpotAt(ref, pointMm);
    spot.piece.edgeLabels.push(panelBodyLabel(spot.frame, pointMm, num));
  };
  const threads: WireBoomThread[] = [];
  model.appendages.forEach((a, i) => {
    const step = i + 2;
    const face = body.faces.find((f) => f.ref === a.face)!;
    const foot = appendageFootMm(a, face, N);
    const base = { id: a.id, partId: a.id, label: a.label, assemblyStep: step };
    switch (a.kind) {
      case 'rigid-boom': {
        const stock = boomStockFor(a.diameterM * k, a.lengthM * k);
        const axis = appendageDirection(a.orientation, face);
        if (stock) {
          substitutes.push({
            kind: 'boom-stock',
            partId: a.id,
            label: a.label,
            stock,
            lengthMm: a.lengthM * k,
            diameterMm: a.diameterM * k,
            fromMm: foot,
            toMm: vec3Combine([1, foot], [a.lengthM * k, axis]),
          });
          break;
        }
        const frame = frameAlongAxis(foot, axis, face);
        pieces.push(
          tubePiece({
            ...base,
            diameterMm: a.diameterM * k,
            lengthMm: a.lengthM * k,
            frame,
            tabNumber: next(),
            overlapMm: paperOverlapMm(gsm),
          }),
        );
        break;
      }
      case 'dish':
      case 'nozzle': {
        const [R, r, h] =
          a.kind === 'dish'
            ? [a.diameterM / 2, (a.innerDiameterM ?? 0) / 2, a.depthM]
            : [a.exitDiameterM / 2, a.throatDiameterM / 2, a.lengthM];
        const development = coneDevelopment(R * k, r * k, h * k)!;
        const axis = appendageDirection(a.orientation, face);
        if (coneTooSmall(2 * R * k, band)) {
          substitutes.push({ kind: 'flat-disc', partId: a.id, label: a.label, diameterMm: 2 * R * k });
          pieces.push(flatDiscPiece({ ...base, partKind: a.kind }, R * k, frameAroundAxis(foot, axis, face)));
          break;
        }
        // The narrow end sits on the face; a frustum's virtual apex lies h·r/(R − r) behind it.
        const apex = vec3Combine([1, foot], [(-h * k * r) / (R - r), axis]);
        pieces.push(
          conePiece({
            ...base,
            partKind: a.kind,
            development,
            frame: frameAroundAxis(apex, axis, face),
            tabNumber: next(),
            tabDepthMm: paperTabDepthMm(gsm),
          }),
        );
        break;
      }
      case 'solar-panel': {
        const [w, h] = [a.widthM * k, a.heightM * k];
        const frame = {
          originMm: vec3Combine([1, foot], [-w / 2, face.uAxis], [-h / 2, face.vAxis]),
          xAxis: face.uAxis,
          yAxis: face.vAxis,
        };
        pieces.push(panelPiece({ ...base, widthMm: w, heightMm: h, frame }));
        break;
      }
      case 'deployable-panel': {
        const [w, h] = [a.widthM * k, a.heightM * k];
        const along = a.hingeEdge === 'top' || a.hingeEdge === 'bottom' ? a.position.uM * k : a.position.vM * k;
        const faceW = Math.hypot(...vec3Combine([1, face.polygonMm[1]!], [-1, face.polygonMm[0]!]));
        const faceH = face.polygonMm[2]![2];
        const placed = deployablePanelFrame(
          face,
          a.hingeEdge,
          along,
          w,
          faceW,
          faceH,
          (a.deployAngleDeg * Math.PI) / 180,
        );
        const num = next();
        pieces.push(
          panelPiece({
            ...base,
            widthMm: w,
            heightMm: h,
            frame: placed.frame,
            hingeStrip: { number: num, depthMm: paperTabDepthMm(gsm, w), angleRad: placed.stripAngleRad },
          }),
        );
        markFace(a.face, placed.hingeMidMm, num);
        break;
      }
      case 'wire-boom': {
        const num = next();
        const spot = wireAnchorPlacement(
          face,
          foot,
          Math.max(WIRE_ANCHOR_SIZE_MM, BUILDABILITY_MINIMUMS[band].pieceMm),
        );
        pieces.push(
          wireAnchorPiece({
            ...base,
            id: `${a.id}-anchor`,
            label: `${a.label} anchor`,
            face,
            footMm: spot.centreMm,
            sideMm: spot.sideMm,
            tabNumber: num,
          }),
        );
        markFace(a.face, spot.centreMm, num);
        threads.push(wireBoomThread(a.id, a.label, a.lengthM, N));
        break;
      }
    }
  });
  return { pieces, threads, substitutes };
}

/** A dish or nozzle too small to roll, as a flat disc of its wide end lying across its axis at its foot. */
function flatDiscPiece(
  base: Pick<Piece, 'id' | 'partId' | 'label' | 'assemblyStep' | 'partKind'>,
  radiusMm: number,
  frame: PlaneFrame,
): Piece {
  const circle = arcPoints([0, 0], radiusMm, 0, 2 * Math.PI).slice(0, -1);
  return pieceFromNet({
    ...base,
    faces: [{ flatMm: circle, modelMm: circle.map(([x, y]) => frameApply(frame, [x, y, 0])) }],
    joints: [],
    tabs: [],
    edgeLabels: [],
    rootFrame: frame,
  });
}
