/**
 * The label texts of a sheet and their boxes: each new label is kept clear of the drawing, of the labels before
 * it and of callout leaders; a mark with no room on its piece is printed beside it with a leader line.
 */
import type { SheetVec2Mm } from '../layout/types';
import { LABEL_BOX_HEIGHT_EM, type LabelMeasure, labelBox } from './label-placement';
import { LABEL_LINE_CLEARANCE_MM, LabelObstacles, labelBoxNearestPoint } from './label-obstacles';
import { GLUE_MARK_UNDERLINE_EM, glueMarkUnderlined } from './glue-marks';
import { TEXT_COLOR } from './line-styles';
import type { SceneText, SheetScene } from './scene-types';

/** The box a text covers on the sheet, measured with `measure`. */
export function sceneTextBox(t: SceneText, measure: LabelMeasure): SheetVec2Mm[] {
  return labelBox(t.atMm, t.angleRad, measure(t.text, t.sizeMm, t.bold), t.sizeMm * LABEL_BOX_HEIGHT_EM, t.anchor);
}

/** The label texts of a sheet and their boxes, so each new label can be kept clear of the drawing and of the ones before. */
export class SceneLabels {
  private readonly placed = new LabelObstacles(0);
  /** Callout leaders drawn so far: later labels keep clear of them like of any line. */
  private readonly leaders = new LabelObstacles(LABEL_LINE_CLEARANCE_MM);
  private readonly widths = new Map<string, number>();
  constructor(
    readonly scene: SheetScene,
    readonly measure: LabelMeasure,
    readonly obstacles: LabelObstacles,
  ) {}

  box(t: SceneText): SheetVec2Mm[] {
    const key = `${t.bold ? 'b' : 'r'}${t.sizeMm}|${t.text}`;
    let width = this.widths.get(key);
    if (width === undefined) this.widths.set(key, (width = this.measure(t.text, t.sizeMm, t.bold)));
    return labelBox(t.atMm, t.angleRad, width, t.sizeMm * LABEL_BOX_HEIGHT_EM, t.anchor);
  }

  /** Adds a text at its own place whatever it covers (the last resort of a mark that must print). */
  reserve(t: SceneText) {
    this.push(t, this.box(t));
  }

  /**
   * Adds the first of the candidate texts whose box is clear of every label and drawn element and passes
   * `fits`; false when none is.
   */
  tryPlace(candidates: Iterable<SceneText>, fits: (box: SheetVec2Mm[]) => boolean = () => true): boolean {
    for (const t of candidates) {
      const box = this.box(t);
      if (fits(box) && !this.placed.hits(box) && !this.obstacles.hits(box) && !this.leaders.hits(box)) {
        this.push(t, box);
        return true;
      }
    }
    return false;
  }

  /**
   * For a mark its piece has no room for (a part too small for its kit's readers): the mark upright on clear
   * paper near the first target, with a thin leader line from the mark to one of `targets` that no label
   * covers; false when nothing within CALLOUT_RADII_MM is clear.
   */
  tryCallout(t: SceneText, targets: readonly SheetVec2Mm[], fits: (box: SheetVec2Mm[]) => boolean): boolean {
    const home = targets[0]!;
    const free = targets.filter((p) => !this.placed.hits([p, p]));
    for (const r of CALLOUT_RADII_MM)
      for (let k = 0; k < CALLOUT_DIRECTIONS; k++) {
        const a = (2 * Math.PI * k) / CALLOUT_DIRECTIONS;
        const candidate = { ...t, atMm: [home[0] + r * Math.cos(a), home[1] + r * Math.sin(a)] as SheetVec2Mm };
        const box = this.box(candidate);
        if (!fits(box) || this.placed.hits(box) || this.obstacles.hits(box) || this.leaders.hits(box)) continue;
        // The leader runs from the box's nearest side to a point of the mark's place and crosses no label.
        for (const target of free) {
          const leader: SheetVec2Mm[] = [labelBoxNearestPoint(box, target), target];
          if (this.placed.hits(leader)) continue;
          this.push({ ...candidate, calloutMm: target }, box);
          this.scene.strokes.push({
            points: leader,
            widthMm: CALLOUT_LEADER_MM,
            color: TEXT_COLOR,
            dashMm: [],
            group: 'labels',
          });
          this.leaders.add(leader);
          return true;
        }
      }
    return false;
  }

  private push(t: SceneText, box: SheetVec2Mm[]) {
    this.scene.texts.push(t);
    this.placed.add(box);
    if (t.mark && glueMarkUnderlined(t.text)) {
      // The underline runs under the digits along the baseline: within the box, so it needs no room of its own.
      const [c, s] = [Math.cos(t.angleRad), Math.sin(t.angleRad)];
      const width = this.measure(t.text, t.sizeMm, t.bold);
      const [x0, x1] = t.anchor === 'middle' ? [-width / 2, width / 2] : [0, width];
      const down = GLUE_MARK_UNDERLINE_EM.offset * t.sizeMm;
      const at = (x: number): SheetVec2Mm => [t.atMm[0] + c * x - s * down, t.atMm[1] + s * x + c * down];
      this.scene.strokes.push({
        points: [at(x0), at(x1)],
        widthMm: GLUE_MARK_UNDERLINE_EM.width * t.sizeMm,
        color: TEXT_COLOR,
        dashMm: [],
        group: 'labels',
      });
    }
  }
}

/** Distances from its home tried for a mark printed beside its piece, mm, nearest first. */
const CALLOUT_RADII_MM = [4, 6, 8, 11, 14, 18, 23, 30, 40, 50, 65, 80, 100, 125];
/** Directions tried round the home at each distance. */
const CALLOUT_DIRECTIONS = 36;
/** Width of a callout's leader line, mm. */
const CALLOUT_LEADER_MM = 0.15;
