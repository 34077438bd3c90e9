import { useState } from 'react';
import { classCodeFormat } from '../../lib/auth/class-code';
import { apiSend } from '../auth/api-post';
import { FormAlert } from '../auth/FormAlert';

interface Props {
  classId: string;
  code: string;
}

/** Shows the class code and gives the class a new one (every device opened with the old code is closed). */
export default function RotateCodeButton({ classId, code: initial }: Props) {
  const [code, setCode] = useState(initial);
  const [message, setMessage] = useState<{ kind: 'error' | 'success'; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  async function rotate() {
    if (!window.confirm('Make a new code? Students who joined with the old code will need the new one.')) return;
    setBusy(true);
    const result = await apiSend<{ joinCode: string; sessionsEnded: number }>(
      'POST',
      `/api/classes/${classId}/rotate-code`,
    );
    setBusy(false);
    if (result.ok) {
      setCode(result.data.joinCode);
      setMessage({ kind: 'success', text: `New code ready; ${result.data.sessionsEnded} open device(s) were closed.` });
    } else {
      setMessage({ kind: 'error', text: result.message });
    }
  }
  return (
    <div className="space-y-3">
      <p className="font-mono text-3xl font-bold tracking-widest" data-testid="class-code" aria-live="polite">
        {classCodeFormat(code)}
      </p>
      <button type="button" className="btn-secondary" onClick={rotate} disabled={busy}>
        Make a new code
      </button>
      {message && <FormAlert kind={message.kind} message={message.text} />}
    </div>
  );
}
