import type { UseFormRegister } from 'react-hook-form';
import type { KitForm, KitVenueChoice } from '../../lib/kit/kit-settings';
import SelectField from '../tools/SelectField';
import RegisteredNumberField from './RegisteredNumberField';

interface Props {
  venues: { id: string; label: string }[];
  value: KitVenueChoice | undefined;
  register: UseFormRegister<KitForm>;
  /** The form's messages for a custom floor's length and width. */
  errors: { lengthM?: string | undefined; widthM?: string | undefined };
  onChange: (venue: KitVenueChoice) => void;
}

/** Size of a custom floor a teacher starts from, m (common practice, no source: a large classroom). */
const CUSTOM_FLOOR_START = { lengthM: 30, widthM: 20 } as const;

const capitalised = (s: string) => s[0]!.toUpperCase() + s.slice(1);

/** Where the booms are laid out: a preset venue, or a custom floor with its length and width in metres. */
export default function VenueFields({ venues, value, register, errors, onChange }: Props) {
  const venueKey = value?.kind === 'preset' ? value.id : 'custom';
  return (
    <div>
      <SelectField
        label="Venue for the booms"
        name="venue"
        value={venueKey}
        options={[
          ...venues.map((v) => ({ value: v.id, label: capitalised(v.label) })),
          { value: 'custom', label: 'Custom length × width' },
        ]}
        onChange={(id) =>
          onChange(id === 'custom' ? { kind: 'custom', ...CUSTOM_FLOOR_START } : { kind: 'preset', id })
        }
      />
      {venueKey === 'custom' && (
        <div className="mt-2 grid grid-cols-2 gap-3">
          <RegisteredNumberField
            label="Length, m"
            step="any"
            min={0}
            error={errors.lengthM}
            registration={register('venue.lengthM', { valueAsNumber: true })}
          />
          <RegisteredNumberField
            label="Width, m"
            step="any"
            min={0}
            error={errors.widthM}
            registration={register('venue.widthM', { valueAsNumber: true })}
          />
        </div>
      )}
    </div>
  );
}
