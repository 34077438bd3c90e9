import { useState } from 'react';
import { apiSettle } from '../../lib/http/client';
import { FormAlert } from './FormAlert';

interface Props {
  token: string;
}

/**
 * One button that uses the verification link. A button rather than on page load, so a mail scanner that
 * opens links cannot use the one-time token up.
 */
export default function VerifyEmailForm({ token }: Props) {
  const [state, setState] = useState<'idle' | 'busy' | 'done'>('idle');
  const [error, setError] = useState<string | null>(null);
  async function confirm(event: { preventDefault(): void }) {
    event.preventDefault();
    setState('busy');
    setError(null);
    const result = await apiSettle<{ message: string }>('/api/auth/verify-email', { body: { token } });
    if (result.ok) {
      setState('done');
      return;
    }
    setError(result.error.message);
    setState('idle');
  }
  if (state === 'done') {
    return (
      <div className="space-y-3">
        <FormAlert kind="success" message="Your e-mail address is confirmed. You can sign in now." />
        <a href="/sign-in" className="btn-primary">
          Go to sign-in
        </a>
      </div>
    );
  }
  return (
    <form method="post" onSubmit={confirm} className="space-y-4">
      <FormAlert kind="error" message={error} />
      <button type="submit" className="btn-primary" disabled={state === 'busy'}>
        Confirm my e-mail address
      </button>
    </form>
  );
}
