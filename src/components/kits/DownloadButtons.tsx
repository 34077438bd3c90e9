import { useState } from 'react';
import { apiFileProgress, ApiError } from '../../lib/http/client';
import { kitStagesOf, type KitStageDone } from '../../lib/kit/kit-stages';
import BuildProgress from './BuildProgress';
import type { KitForm } from '../../lib/kit/kit-settings';
import type { KitView } from './kit-queries';

interface Props {
  form: KitForm | null;
  saved: KitView | null;
  sheetCount: number;
}

type Output = 'pdf' | 'svg' | 'stl';
const LABELS: Record<Output, string> = {
  pdf: 'PDF to print',
  svg: 'SVG for a cutting machine',
  stl: 'STL for a 3D printer',
};

/**
 * Downloads: a saved kit's links (its QR code points at its own page), or, before saving, files built from
 * the current settings (their QR code points at the builder).
 */
export default function DownloadButtons({ form, saved, sheetCount }: Props) {
  const [busy, setBusy] = useState<{ output: Output; abort: AbortController } | null>(null);
  const [done, setDone] = useState<KitStageDone[]>([]);
  const [error, setError] = useState<string | null>(null);

  if (saved) {
    return (
      <ul className="flex flex-wrap gap-2" aria-label="Downloads">
        <li>
          <a className="btn-secondary" href={saved.links.pdf} download>
            Download {LABELS.pdf}
          </a>
        </li>
        <li>
          <a className="btn-secondary" href={saved.links.svgSheets[0]} download>
            Download {LABELS.svg} (sheet 1 of {saved.sheetCount})
          </a>
        </li>
        <li>
          <a className="btn-secondary" href={saved.links.stl} download>
            Download {LABELS.stl}
          </a>
        </li>
      </ul>
    );
  }

  const download = async (output: Output) => {
    if (!form) return;
    const abort = new AbortController();
    setBusy({ output, abort });
    setDone([]);
    setError(null);
    try {
      const { blob, fileName } = await apiFileProgress('/api/kits/preview-file', {
        body: { inputs: form, output, ...(output === 'svg' ? { sheet: 1 } : {}) },
        signal: abort.signal,
        onStage: (stage, ms) => setDone((d) => [...d, { stage, ms }]),
      });
      const url = URL.createObjectURL(blob);
      const a = document.createElement('a');
      a.href = url;
      a.download = fileName;
      a.click();
      setTimeout(() => URL.revokeObjectURL(url), 10_000);
    } catch (err) {
      if (!abort.signal.aborted) setError(err instanceof ApiError ? err.message : 'The download failed.');
    } finally {
      setBusy(null);
    }
  };

  return (
    <div>
      <div className="flex flex-wrap gap-2" role="group" aria-label="Downloads">
        {(['pdf', 'svg', 'stl'] as const).map((o) => (
          <button
            key={o}
            type="button"
            className="btn-secondary"
            disabled={!form || busy !== null}
            onClick={() => download(o)}
          >
            {busy?.output === o
              ? 'Preparing…'
              : `Download ${LABELS[o]}${o === 'svg' && sheetCount > 1 ? ` (sheet 1 of ${sheetCount})` : ''}`}
          </button>
        ))}
      </div>
      {busy && (
        <div className="mt-2 text-sm" aria-live="polite">
          <BuildProgress
            what={`the ${busy.output.toUpperCase()}`}
            planned={kitStagesOf(busy.output)}
            done={done}
            onCancel={() => busy.abort.abort()}
          />
        </div>
      )}
      <p className="mt-1 text-xs text-ink-soft">
        Save the kit first to give its QR code a page of its own and an SVG per sheet.
      </p>
      {error && (
        <p role="alert" className="field-error">
          {error}
        </p>
      )}
    </div>
  );
}
