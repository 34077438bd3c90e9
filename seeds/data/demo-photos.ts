/**
 * Photos for the demo journal entries, drawn here (paper models on a bench, never people) as SVG and turned into
 * JPEG by sharp, then stored through the upload pipeline (entryPhotosStore: re-encoded, metadata dropped, a display
 * copy and a thumbnail in the configured storage), so the demo's entries show photos on every page that has them.
 */
import type { Knex } from 'knex';
import sharp from 'sharp';
import { entryPhotosStore } from '../../src/lib/photos/entry-photos.server';

const W = 960;
const H = 720;

/** A paper model drawn on a work bench: a body of `sides` faces, two panels and a label. */
function drawnModelSvg(o: { sides: number; body: string; panel: string; sky: string }): string {
  const cx = W / 2;
  const cy = H / 2 - 30;
  const r = 150;
  const face = Array.from({ length: o.sides }, (_, i) => {
    const a = (Math.PI * 2 * i) / o.sides - Math.PI / 2;
    return `${(cx + r * Math.cos(a)).toFixed(1)},${(cy + r * Math.sin(a)).toFixed(1)}`;
  }).join(' ');
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}">
  <rect width="${W}" height="${H}" fill="${o.sky}"/>
  <rect y="${H - 170}" width="${W}" height="170" fill="#b98b5b"/>
  <rect y="${H - 170}" width="${W}" height="10" fill="#8a6440"/>
  <rect x="${cx - r - 230}" y="${cy - 40}" width="200" height="80" fill="${o.panel}" stroke="#1b2330" stroke-width="4"/>
  <rect x="${cx + r + 30}" y="${cy - 40}" width="200" height="80" fill="${o.panel}" stroke="#1b2330" stroke-width="4"/>
  <line x1="${cx - r - 30}" y1="${cy}" x2="${cx - r + 10}" y2="${cy}" stroke="#1b2330" stroke-width="6"/>
  <line x1="${cx + r - 10}" y1="${cy}" x2="${cx + r + 30}" y2="${cy}" stroke="#1b2330" stroke-width="6"/>
  <polygon points="${face}" fill="${o.body}" stroke="#1b2330" stroke-width="5"/>
  <circle cx="${cx}" cy="${cy}" r="40" fill="#f4f1ea" stroke="#1b2330" stroke-width="4"/>
  <rect x="${cx - 60}" y="${H - 120}" width="120" height="40" fill="#f4f1ea" stroke="#1b2330" stroke-width="3"/>
</svg>`;
}

/** The demo's drawn photos by entry title, each with its alt text. */
const PHOTOS: Record<string, { svg: string; altText: string }[]> = {
  'Our probe survived the shake table': [
    {
      svg: drawnModelSvg({ sides: 6, body: '#d9d4c7', panel: '#2b3a67', sky: '#e8eef6' }),
      altText: 'The hexagonal paper probe with both solar panels on, standing on the bench after the third run',
    },
    {
      svg: drawnModelSvg({ sides: 6, body: '#f0c36d', panel: '#2b3a67', sky: '#f4f1ea' }),
      altText: 'The same probe from the front, the glued tabs along its edges',
    },
  ],
  'Shaking the Wren at 20 Hz and 80 Hz': [
    {
      svg: drawnModelSvg({ sides: 4, body: '#c9d7cf', panel: '#0d6b62', sky: '#eef3ef' }),
      altText: 'The square Wren model on its foam block, panels folded out',
    },
  ],
  'Room 12 built the Wren': [
    {
      svg: drawnModelSvg({ sides: 4, body: '#e7d3c1', panel: '#8a5300', sky: '#f6efe6' }),
      altText: 'A finished Wren on the classroom bench',
    },
  ],
};

/** Stores the drawn photos on the demo entries that have some, by title. */
export async function seedDemoPhotos(knex: Knex, entries: { id: string; title: string }[]): Promise<void> {
  for (const entry of entries) {
    const photos = PHOTOS[entry.title];
    if (!photos) continue;
    const drawn = await Promise.all(
      photos.map(async (p) => ({
        bytes: await sharp(Buffer.from(p.svg)).jpeg({ quality: 85 }).toBuffer(),
        altText: p.altText,
      })),
    );
    await entryPhotosStore(entry.id, drawn, knex);
  }
}
