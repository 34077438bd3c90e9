/** A minimal valid activity frontmatter for schema tests; each test breaks one thing. */
import type { ActivityInput } from '../../../src/lib/activities/activity-schema';

export function activityFixture(overrides: Partial<ActivityInput> = {}): ActivityInput {
  return {
    title: 'Fixture activity',
    summary: 'A made-up activity used only by the schema tests.',
    slug: 'fixture-activity',
    gradeBands: ['6-8'],
    timeMinutes: 45,
    teamSize: { min: 2, max: 4 },
    testKind: 'magnetic',
    models: ['skein-probe'],
    learningGoals: ['Read a field against distance.'],
    standards: [{ code: 'MS-PS2-3', note: 'Teams collect field readings.' }],
    materials: [{ item: 'Meter stick', quantity: 1 }],
    preparation: ['Clear the table.'],
    steps: ['One.', 'Two.', 'Three.'],
    record: {
      tool: 'magnetic',
      instructions: 'One row per reading.',
      rows: 5,
      columns: [
        { key: 'distance_cm', name: 'Distance', unit: 'cm', tool: 'magnetic' },
        { key: 'field_ut', name: 'Field', unit: 'µT', tool: 'magnetic' },
      ],
    },
    discussion: ['What did you find?'],
    ...overrides,
  };
}
