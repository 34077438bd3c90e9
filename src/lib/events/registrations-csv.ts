/**
 * The registrations of an event as CSV for coordinators (papaparse; its escapeFormulae option prefixes a quote
 * to cells starting with = + - @ tab or CR, so a name cannot run as a spreadsheet formula).
 */
import Papa from 'papaparse';
import type { RegistrationView } from '../db/events';

export const REGISTRATION_CSV_HEADER = [
  'Name',
  'E-mail',
  'School',
  'State',
  'Account',
  'Registered (UTC)',
  'Cancelled (UTC)',
];

export function registrationsCsv(rows: RegistrationView[]): string {
  return Papa.unparse(
    {
      fields: REGISTRATION_CSV_HEADER,
      data: rows.map((r) => [
        r.name,
        r.email,
        r.schoolName ?? '',
        r.state,
        r.signedIn ? 'yes' : 'no',
        r.createdAt,
        r.cancelledAt ?? '',
      ]),
    },
    { escapeFormulae: true, newline: '\r\n' },
  );
}
