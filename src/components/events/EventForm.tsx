/**
 * A coordinator's event form, new or existing: the API's own EventCreateSchema checks it in the browser, and
 * the server's field errors land beside their fields. Times are typed as the wall clock at the venue, with the
 * venue's time zone beside them. Big builds also take the venue size and build scale the plan packet uses.
 */
import { useState } from 'react';
import type { z } from 'zod';
import {
  EVENT_CAPACITY_MAX,
  EVENT_KINDS,
  EVENT_KIND_LABELS,
  EVENT_TEXT_MAX,
  EVENT_TITLE_MAX,
  EVENT_VENUE_MAX,
  EventCreateSchema,
  type EventCreate,
} from '../../lib/events/event-schemas';
import { VENUES } from '../../lib/layout/venues';
import { FormAlert } from '../auth/FormAlert';
import { numberOrNull } from '../auth/field-values';
import FieldShell from '../tools/FieldShell';
import RegisteredSelect, { type Option } from './RegisteredSelect';
import { FormField } from '../auth/FormField';
import { useApiForm } from '../auth/useApiForm';

interface Props {
  /** The event being changed; absent for a new one. */
  eventId?: string;
  initial: EventCreate;
  schools: Option[];
  kits: Option[];
  activities: Option[];
  timeZones: string[];
}

/** An empty field is "none" (null), as the schema wants; anything else is kept as typed. */
const textOrNull = (v: string | null) => (v ? v : null);

export default function EventForm({ eventId, initial, schools, kits, activities, timeZones }: Props) {
  const [saved, setSaved] = useState<string | null>(null);
  const { form, onSubmit, formError } = useApiForm<
    z.input<typeof EventCreateSchema>,
    EventCreate,
    { event: { id: string } }
  >({
    schema: EventCreateSchema,
    method: eventId ? 'PATCH' : 'POST',
    path: eventId ? `/api/events/${eventId}` : '/api/events',
    defaultValues: initial,
    onSuccess: (data) => {
      if (eventId) setSaved('Changes saved.');
      else window.location.assign(`/events/manage/${data.event.id}`);
    },
  });
  const { errors, isSubmitting } = form.formState;
  const kind = form.watch('kind');
  const zoneOptions = timeZones.map((z) => ({ value: z, label: z.replace(/_/g, ' ') }));
  return (
    <form
      method="post"
      noValidate
      onSubmit={(e) => {
        setSaved(null);
        void onSubmit(e);
      }}
      className="space-y-4"
      aria-label={eventId ? 'Change the event' : 'Plan a new event'}
    >
      <FormAlert kind="error" message={formError} />
      <FormField
        id="title"
        label="Title"
        maxLength={EVENT_TITLE_MAX}
        registration={form.register('title')}
        error={errors.title}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <RegisteredSelect
          label="Kind"
          options={EVENT_KINDS.map((k) => ({ value: k, label: EVENT_KIND_LABELS[k] }))}
          registration={form.register('kind')}
          error={errors.kind}
        />
        <FormField
          id="capacity"
          label="Places"
          type="number"
          inputMode="numeric"
          min={1}
          max={EVENT_CAPACITY_MAX}
          hint="Leave empty for no limit. When the places are taken, new registrations join a waiting list."
          registration={form.register('capacity', { setValueAs: numberOrNull })}
          error={errors.capacity}
        />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <FormField
          id="startsLocal"
          label="Starts (time at the venue)"
          type="datetime-local"
          registration={form.register('startsLocal')}
          error={errors.startsLocal}
        />
        <FormField
          id="endsLocal"
          label="Ends (optional)"
          type="datetime-local"
          registration={form.register('endsLocal', { setValueAs: textOrNull })}
          error={errors.endsLocal}
        />
      </div>
      <RegisteredSelect
        label="Venue time zone"
        hint="Calendars and reminders use it, so everyone sees the right time wherever they are."
        options={zoneOptions}
        registration={form.register('timeZone')}
        error={errors.timeZone}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <FormField
          id="venue"
          label="Venue"
          maxLength={EVENT_VENUE_MAX}
          hint="For example: Gym, or School football field."
          registration={form.register('venue')}
          error={errors.venue}
        />
        <RegisteredSelect
          label="Host school"
          empty="No host school"
          options={schools}
          registration={form.register('schoolId', { setValueAs: textOrNull })}
          error={errors.schoolId}
        />
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        <RegisteredSelect
          label="Activity"
          empty="No activity"
          options={activities}
          registration={form.register('activitySlug', { setValueAs: textOrNull })}
          error={errors.activitySlug}
        />
        <RegisteredSelect
          label="Kit"
          empty="No kit"
          options={kits}
          registration={form.register('kitId', { setValueAs: textOrNull })}
          error={errors.kitId}
        />
      </div>
      <FieldShell
        label="Description"
        hint="Shown on the public page once published. Say what teachers bring and who the event is for."
        error={errors.description?.message}
      >
        {({ id, describedBy }) => (
          <textarea
            id={id}
            rows={5}
            maxLength={EVENT_TEXT_MAX}
            className="field-input"
            aria-invalid={errors.description ? true : undefined}
            aria-describedby={describedBy}
            {...form.register('description')}
          />
        )}
      </FieldShell>
      {kind === 'big_build' && (
        <fieldset className="space-y-4 rounded-lg border border-ink/15 p-4">
          <legend className="px-1 font-semibold">Big build: venue and scale</legend>
          <RegisteredSelect
            label="Venue preset"
            empty="None: type the size below"
            options={Object.values(VENUES).map((v) => ({ value: v.id, label: v.label }))}
            registration={form.register('venuePreset', { setValueAs: textOrNull })}
            error={errors.venuePreset}
          />
          <div className="grid gap-4 sm:grid-cols-3">
            <FormField
              id="venueLengthM"
              label="Venue length (m)"
              type="number"
              inputMode="decimal"
              step="any"
              registration={form.register('venueLengthM', { setValueAs: numberOrNull })}
              error={errors.venueLengthM}
            />
            <FormField
              id="venueWidthM"
              label="Venue width (m)"
              type="number"
              inputMode="decimal"
              step="any"
              registration={form.register('venueWidthM', { setValueAs: numberOrNull })}
              error={errors.venueWidthM}
            />
            <FormField
              id="buildScaleDenominator"
              label="Scale 1 : N (1 = life-size)"
              type="number"
              inputMode="numeric"
              min={1}
              registration={form.register('buildScaleDenominator', { setValueAs: numberOrNull })}
              error={errors.buildScaleDenominator}
            />
          </div>
        </fieldset>
      )}
      <FormAlert kind="success" message={saved} />
      <button type="submit" className="btn-primary" disabled={isSubmitting}>
        {eventId ? 'Save changes' : 'Save as a draft'}
      </button>
    </form>
  );
}
