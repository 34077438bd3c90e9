/**
 * The printable teacher guide of an activity as a PDF: overview, safety first (every declared hazard's
 * caution and the school-rules note), goals, standards, materials, preparation, numbered steps, what
 * students record, discussion, extensions, the background from the guide's body, and the kit builder links.
 */
import type { PdfFonts } from '../render/pdf-kit';
import { TEST_KIND_LABELS, gradeBandsLabel, minutesLabel } from './activity-facets';
import { activityKitBuilderHref, type ActivityPaper } from './activity-links';
import type { Activity } from './activity-schema';
import { markdownBlocks } from './markdown-blocks';
import { activityMaterialLabel, activityTeamLabel } from './activity-text';
import {
  pdfFlowBox,
  pdfFlowBytes,
  pdfFlowFooters,
  pdfFlowHeading,
  pdfFlowList,
  pdfFlowNew,
  pdfFlowText,
  type PdfFlowBlock,
} from './pdf-flow';
import { SAFETY_GENERAL_NOTE, hazardCaution } from './safety';

export interface GuidePdfOptions {
  paper?: ActivityPaper;
  /** The guide's Markdown body (background sections). */
  body?: string;
  /** Site origin for printed links, e.g. "https://kits.example.org"; without it links print as paths. */
  origin?: string;
}

/** The teacher guide's PDF bytes; the page count grows with the guide's length. */
export function guidePdf(activity: Activity, fonts: PdfFonts, options: GuidePdfOptions = {}): Uint8Array<ArrayBuffer> {
  const { paper = 'letter', body = '', origin = '' } = options;
  const flow = pdfFlowNew(paper, fonts, `${activity.title}: teacher guide`, activity.summary);
  const soft = { sizePt: 10, color: '#46505f' };

  pdfFlowText(flow, 'Teacher guide', { ...soft, afterMm: 1 });
  pdfFlowText(flow, activity.title, { sizePt: 20, bold: true, afterMm: 2 });
  pdfFlowText(flow, activity.summary, { afterMm: 2 });
  pdfFlowText(
    flow,
    [
      gradeBandsLabel(activity.gradeBands),
      minutesLabel(activity.timeMinutes),
      activityTeamLabel(activity.teamSize),
      TEST_KIND_LABELS[activity.testKind],
    ].join(' · '),
    { ...soft, afterMm: 3 },
  );

  pdfFlowHeading(flow, 'Safety first');
  const cautions: PdfFlowBlock[] = (activity.safety?.hazards ?? []).flatMap((h) => [
    { text: hazardCaution(h).label, bold: true, afterMm: 0.5 },
    { text: hazardCaution(h).caution, afterMm: 2 },
  ]);
  for (const note of activity.safety?.notes ?? []) cautions.push({ text: note, afterMm: 2 });
  cautions.push({ text: SAFETY_GENERAL_NOTE, bold: true, afterMm: 0 });
  pdfFlowBox(flow, cautions, '#fbefd9', '#8a5300');

  pdfFlowHeading(flow, 'Learning goals');
  pdfFlowList(flow, activity.learningGoals);
  pdfFlowHeading(flow, 'Standards (NGSS performance expectations)');
  pdfFlowList(
    flow,
    activity.standards.map((s) => `${s.code}: ${s.note}`),
  );
  pdfFlowHeading(flow, 'Materials');
  pdfFlowList(flow, activity.materials.map(activityMaterialLabel));
  pdfFlowHeading(flow, 'Preparation');
  pdfFlowList(flow, activity.preparation);
  pdfFlowHeading(flow, 'Steps');
  pdfFlowList(flow, activity.steps, true);
  pdfFlowHeading(flow, 'What students record');
  pdfFlowText(flow, activity.record.instructions);
  pdfFlowList(
    flow,
    [...activity.record.fields, ...activity.record.columns].map((c) => (c.unit ? `${c.name} (${c.unit})` : c.name)),
  );
  pdfFlowHeading(flow, 'Discussion');
  pdfFlowList(flow, activity.discussion, true);
  if (activity.extensions.length) {
    pdfFlowHeading(flow, 'Extensions');
    pdfFlowList(flow, activity.extensions);
  }
  for (const block of markdownBlocks(body)) {
    if (block.kind === 'heading') pdfFlowHeading(flow, block.text, 12);
    else pdfFlowText(flow, block.text, { afterMm: 2.5 });
  }
  pdfFlowHeading(flow, 'Kits for this activity');
  pdfFlowList(
    flow,
    activity.models.map((id) => `${id}: ${origin}${activityKitBuilderHref(id, activity.slug)}`),
  );
  pdfFlowText(flow, `Student data sheet: ${origin}/activities/${activity.slug}/data-sheet.pdf`, soft);

  pdfFlowFooters(flow, `Kitwright · ${activity.slug} · teacher guide`);
  return pdfFlowBytes(flow);
}
