import { describe, expect, it } from 'vitest';
import { eventPlaces, eventWhereLabel } from '../../../src/lib/events/event-places';

describe('eventPlaces', () => {
  it('counts the places left of a limited event', () => {
    expect(eventPlaces(20, 16, 0)).toEqual({ left: 4, full: false, label: '4 of 20 places left' });
    expect(eventPlaces(1, 0, 0).label).toBe('1 of 1 place left');
  });

  it('calls an event full when every place is taken, and says how long the waiting list is', () => {
    expect(eventPlaces(20, 20, 3)).toEqual({ left: 0, full: true, label: 'Full: 3 on the waiting list' });
    expect(eventPlaces(20, 20, 0).label).toBe('Full: nobody on the waiting list yet');
  });

  it('never shows a negative number when a coordinator lowers the capacity below the places taken', () => {
    expect(eventPlaces(10, 12, 0)).toMatchObject({ left: 0, full: true });
  });

  it('has no count for an event without a limit', () => {
    expect(eventPlaces(null, 40, 0)).toEqual({ left: null, full: false, label: 'No limit on places' });
  });
});

describe('eventWhereLabel', () => {
  it('joins the venue and the host school', () => {
    expect(eventWhereLabel('Gym', 'Larkspur Elementary')).toBe('Gym, Larkspur Elementary');
  });

  it('leaves the school out when the venue already names it, whatever the case', () => {
    expect(eventWhereLabel('Field of Larkspur elementary', 'Larkspur Elementary')).toBe('Field of Larkspur elementary');
  });

  it('gives whichever part there is, or nothing', () => {
    expect(eventWhereLabel('', 'Larkspur Elementary')).toBe('Larkspur Elementary');
    expect(eventWhereLabel('Town hall', null)).toBe('Town hall');
    expect(eventWhereLabel('  ', null)).toBe('');
  });
});
