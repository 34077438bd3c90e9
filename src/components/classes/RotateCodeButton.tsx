import { useState } from 'react';
import { classCodeFormat, classJoinUrl } from '../../lib/auth/class-code';
import { apiSettle } from '../../lib/http/client';
import { FormAlert } from '../auth/FormAlert';

interface Props {
  classId: string;
  code: string;
  /** The site's public address, for the join link with the code filled in. */
  siteUrl: string;
}

/** Shows the class code large with its join link, and gives the class a new one (devices of the old code close). */
export default function RotateCodeButton({ classId, code: initial, siteUrl }: Props) {
  const [code, setCode] = useState(initial);
  const [message, setMessage] = useState<{ kind: 'error' | 'success'; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  async function rotate() {
    if (!window.confirm('Make a new code? Students who joined with the old code will need the new one.')) return;
    setBusy(true);
    const result = await apiSettle<{ joinCode: string; sessionsEnded: number }>(`/api/classes/${classId}/rotate-code`, {
      method: 'POST',
    });
    setBusy(false);
    if (result.ok) {
      setCode(result.data.joinCode);
      setMessage({ kind: 'success', text: `New code ready; ${result.data.sessionsEnded} open device(s) were closed.` });
    } else {
      setMessage({ kind: 'error', text: result.error.message });
    }
  }
  return (
    <div className="space-y-3">
      <p
        className="font-mono text-5xl font-bold tracking-widest sm:text-6xl"
        data-testid="class-code"
        aria-live="polite"
      >
        {classCodeFormat(code)}
      </p>
      <p className="text-sm break-all text-ink-soft">
        A link with the code filled in: <span className="font-mono">{classJoinUrl(siteUrl, code)}</span>
      </p>
      <button type="button" className="btn-secondary" onClick={rotate} disabled={busy}>
        Make a new code
      </button>
      {message && <FormAlert kind={message.kind} message={message.text} />}
    </div>
  );
}
