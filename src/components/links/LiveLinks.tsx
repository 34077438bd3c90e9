/**
 * The coordinator's live links: create one (title and target, checked with the API's LinkCreateSchema),
 * change a target (the next scan goes there), retire or restore a code, download its QR code (SVG or PNG,
 * level Q), a sheet of bookmarks or a poster on each print size, and see its scans by day.
 */
import { useState } from 'react';
import type { z } from 'zod';
import { apiSettle } from '../../lib/http/client';
import {
  linkAddress,
  LINK_TARGET_MAX,
  LINK_TITLE_MAX,
  LinkCreateSchema,
  LinkPatchSchema,
  type LinkPrintPaper,
} from '../../lib/links/link-code';
import { FormAlert } from '../auth/FormAlert';
import { FormField } from '../auth/FormField';
import { useApiForm } from '../auth/useApiForm';
import ScansChart from './ScansChart';

/** A live link as GET /api/links answers it. */
export interface LiveLinkView {
  id: string;
  code: string;
  title: string;
  target: string;
  retired: boolean;
  scans: number;
}

interface Props {
  initialLinks: LiveLinkView[];
  /** The site's public base URL, for the printed /go/CODE address. */
  site: string;
  /** The sizes a link prints on (LINK_PRINT_PAPERS) with their labels, from the page. */
  printSizes: PrintSize[];
  /** The page lists only the links its filters keep (an empty list then means none matched). */
  filtered: boolean;
}

/** A print size: its sheet size id and label ("US Letter"). */
export interface PrintSize {
  id: LinkPrintPaper;
  label: string;
}

export default function LiveLinks({ initialLinks, site, printSizes, filtered }: Props) {
  const [links, setLinks] = useState(initialLinks);
  const [chartFor, setChartFor] = useState<LiveLinkView | null>(null);
  const replace = (link: LiveLinkView) => setLinks((ls) => ls.map((l) => (l.id === link.id ? link : l)));
  return (
    <div className="space-y-8">
      <section aria-labelledby="new-link-heading" className="card max-w-2xl">
        <h2 id="new-link-heading" className="text-xl font-bold">
          New live link
        </h2>
        <LinkCreateForm onCreated={(link) => setLinks((ls) => [link, ...ls])} />
      </section>
      <section aria-labelledby="links-heading">
        <h2 id="links-heading" className="text-xl font-bold">
          Links
        </h2>
        {links.length === 0 && filtered ? (
          <p className="card mt-3">No link matches these filters.</p>
        ) : links.length === 0 ? (
          <p className="card mt-3">
            No live links yet. Create one above, print its QR code, and change its target whenever the page it should
            open changes.
          </p>
        ) : (
          <div className="mt-3 overflow-x-auto" role="region" aria-labelledby="links-heading" tabIndex={0}>
            <table className="w-full text-left text-sm" data-testid="live-links">
              <thead>
                <tr className="border-b border-ink/20">
                  <th scope="col" className="py-2 pr-3">
                    Code
                  </th>
                  <th scope="col" className="py-2 pr-3">
                    Title and target
                  </th>
                  <th scope="col" className="py-2 pr-3 text-right">
                    Scans
                  </th>
                  <th scope="col" className="py-2">
                    Actions
                  </th>
                </tr>
              </thead>
              <tbody>
                {links.map((link) => (
                  <LinkRow
                    key={link.id}
                    link={link}
                    site={site}
                    printSizes={printSizes}
                    onChanged={replace}
                    onChart={() => setChartFor(link)}
                  />
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
      {chartFor && (
        <section aria-labelledby="scans-heading">
          <h2 id="scans-heading" className="text-xl font-bold">
            Scans: {chartFor.title}
          </h2>
          <ScansChart linkId={chartFor.id} code={chartFor.code} />
        </section>
      )}
    </div>
  );
}

function LinkCreateForm({ onCreated }: { onCreated: (link: LiveLinkView) => void }) {
  const { form, onSubmit, formError } = useApiForm<
    z.input<typeof LinkCreateSchema>,
    z.infer<typeof LinkCreateSchema>,
    { link: LiveLinkView }
  >({
    schema: LinkCreateSchema,
    path: '/api/links',
    defaultValues: { title: '', target: '' },
    onSuccess: (data) => {
      onCreated(data.link);
      form.reset();
    },
  });
  const { errors, isSubmitting } = form.formState;
  return (
    <form method="post" noValidate onSubmit={onSubmit} className="mt-3 space-y-4" aria-label="New live link">
      <FormAlert kind="error" message={formError} />
      <FormField
        id="link-title"
        label="Title"
        maxLength={LINK_TITLE_MAX}
        hint="For you and your colleagues, e.g. Bookmark: shake test, spring 2027."
        registration={form.register('title')}
        error={errors.title}
      />
      <FormField
        id="link-target"
        label="Target"
        maxLength={LINK_TARGET_MAX}
        hint="A page here (/activities/shake-test) or an https:// address elsewhere."
        registration={form.register('target')}
        error={errors.target}
      />
      <button type="submit" className="btn-primary" disabled={isSubmitting}>
        Create the link
      </button>
    </form>
  );
}

function LinkRow({
  link,
  site,
  printSizes,
  onChanged,
  onChart,
}: {
  link: LiveLinkView;
  site: string;
  printSizes: PrintSize[];
  onChanged: (link: LiveLinkView) => void;
  onChart: () => void;
}) {
  const [editing, setEditing] = useState(false);
  const [target, setTarget] = useState(link.target);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const short = linkAddress(site, link.code);

  async function patch(body: z.input<typeof LinkPatchSchema>) {
    setError(null);
    const checked = LinkPatchSchema.safeParse(body);
    if (!checked.success) return setError(checked.error.issues[0]?.message ?? 'Check the target.');
    setBusy(true);
    const result = await apiSettle<{ link: LiveLinkView }>(`/api/links/${link.id}`, {
      method: 'PATCH',
      body: checked.data,
    });
    setBusy(false);
    if (!result.ok) return setError(result.error.message);
    onChanged(result.data.link);
    setEditing(false);
  }

  const targetId = `target-${link.id}`;
  return (
    <tr className={`border-b border-ink/10 align-top ${link.retired ? 'text-ink-soft' : ''}`}>
      <td className="py-2 pr-3">
        <span className="font-mono text-base font-bold">{link.code}</span>
        {link.retired && <span className="block text-xs">retired</span>}
      </td>
      <td className="py-2 pr-3">
        <span className="font-semibold">{link.title}</span>
        <span className="block break-all text-ink-soft">{short}</span>
        {editing ? (
          <form
            className="mt-2 space-y-2"
            onSubmit={(e) => {
              e.preventDefault();
              void patch({ target });
            }}
          >
            <label htmlFor={targetId} className="field-label">
              New target of {link.code}
            </label>
            <input
              id={targetId}
              className="field-input"
              value={target}
              maxLength={LINK_TARGET_MAX}
              aria-invalid={error ? true : undefined}
              aria-describedby={error ? `${targetId}-error` : undefined}
              onChange={(e) => setTarget(e.target.value)}
            />
            {error && (
              <p id={`${targetId}-error`} className="field-error">
                {error}
              </p>
            )}
            <div className="flex gap-2">
              <button type="submit" className="btn-primary py-1 text-sm" disabled={busy}>
                Save the target
              </button>
              <button
                type="button"
                className="btn-secondary py-1 text-sm"
                onClick={() => {
                  setEditing(false);
                  setTarget(link.target);
                  setError(null);
                }}
              >
                Keep the old one
              </button>
            </div>
          </form>
        ) : (
          <span className="block break-all">
            → <a href={link.target}>{link.target}</a>
          </span>
        )}
        {!editing && error && (
          <p role="alert" className="field-error">
            {error}
          </p>
        )}
      </td>
      <td className="py-2 pr-3 text-right tabular-nums">{link.scans}</td>
      <td className="py-2">
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn-secondary py-1 text-sm" onClick={onChart}>
            Scans by day
          </button>
          {!editing && (
            <button type="button" className="btn-secondary py-1 text-sm" onClick={() => setEditing(true)}>
              Change target
            </button>
          )}
          <a className="btn-secondary py-1 text-sm" href={`/api/links/${link.id}/qr`} download={`${link.code}.svg`}>
            QR SVG
          </a>
          <a
            className="btn-secondary py-1 text-sm"
            href={`/api/links/${link.id}/qr?format=png`}
            download={`${link.code}.png`}
          >
            QR PNG
          </a>
          <button
            type="button"
            className="btn-secondary py-1 text-sm"
            disabled={busy}
            onClick={() => void patch({ retired: !link.retired })}
          >
            {link.retired ? 'Restore' : 'Retire'}
          </button>
        </div>
        <PrintLinks link={link} sizes={printSizes} format="poster" label="Poster PDF" />
        <PrintLinks link={link} sizes={printSizes} format="bookmark" label="Bookmarks PDF" />
      </td>
    </tr>
  );
}

/** One download per print size of a link's poster or bookmark sheet: "Poster PDF: US Letter · A4 · …". */
function PrintLinks({
  link,
  sizes,
  format,
  label,
}: {
  link: LiveLinkView;
  sizes: PrintSize[];
  format: 'poster' | 'bookmark';
  label: string;
}) {
  return (
    <p className="mt-2 text-sm">
      {label}:{' '}
      {sizes.map((size, i) => (
        <span key={size.id}>
          {i > 0 && ' · '}
          <a
            href={`/api/links/${link.id}/poster.pdf?format=${format}&paper=${size.id}`}
            download={`${link.code}-${format}-${size.id}.pdf`}
            aria-label={`${label} of ${link.code} on ${size.label}`}
          >
            {size.label}
          </a>
        </span>
      ))}
    </p>
  );
}
