import { endpoint } from '../../../lib/http/endpoint';
import { JournalBookletQuerySchema } from '../../../lib/journal/entry-rules';
import { journalBookletFor } from '../../../lib/journal/journal-booklet.server';
import { parseInput } from '../../../lib/validation';

/** A class journal as a PDF booklet: a teacher's own class (every entry), or staff's school or class (published). */
export const GET = endpoint({ access: ['teacher', 'coordinator', 'admin'] }, async ({ locals, url }) => {
  const query = parseInput(JournalBookletQuerySchema, Object.fromEntries(url.searchParams), 'query');
  const { bytes, filename } = await journalBookletFor(locals.actor, query);
  return new Response(bytes, {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${filename}"`,
      'cache-control': 'no-store',
    },
  });
});
