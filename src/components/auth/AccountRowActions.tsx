import { useState } from 'react';
import { ROLES, type Role } from '../../lib/auth/actor';
import { apiSettle } from '../../lib/http/client';

interface Props {
  accountId: string;
  email: string;
  role: Role;
  active: boolean;
  /** The admin's own row: no changes offered (an admin cannot lock themselves out). */
  self: boolean;
}

/** Role select and deactivate / reactivate button for one account on the admin page. */
export default function AccountRowActions({ accountId, email, role: initialRole, active: initialActive, self }: Props) {
  const [role, setRole] = useState<Role>(initialRole);
  const [active, setActive] = useState(initialActive);
  const [status, setStatus] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  if (self) return <span className="text-sm text-ink-soft">This is you</span>;

  async function change(body: { role?: Role; active?: boolean }) {
    setBusy(true);
    setStatus(null);
    const result = await apiSettle<{ account: { role: Role; active: boolean } }>(`/api/admin/accounts/${accountId}`, {
      method: 'PATCH',
      body,
    });
    setBusy(false);
    if (result.ok) {
      setRole(result.data.account.role);
      setActive(result.data.account.active);
      setStatus('Saved.');
    } else {
      setStatus(result.error.message);
    }
  }
  return (
    <div className="flex flex-wrap items-center gap-2">
      <label className="sr-only" htmlFor={`role-${accountId}`}>
        Role of {email}
      </label>
      <select
        id={`role-${accountId}`}
        className="rounded-lg border border-ink/30 bg-white px-2 py-1 text-sm"
        value={role}
        disabled={busy}
        onChange={(e) => void change({ role: e.target.value as Role })}
      >
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {r}
          </option>
        ))}
      </select>
      <button
        type="button"
        className="btn-secondary py-1 text-sm"
        disabled={busy}
        onClick={() => void change({ active: !active })}
      >
        {active ? 'Deactivate' : 'Reactivate'}
      </button>
      <span role="status" className="text-sm text-ink-soft">
        {status}
      </span>
    </div>
  );
}
