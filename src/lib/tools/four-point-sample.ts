/**
 * Sample data for the four-point measurement: four thermometers on a 40 cm square on the table with one
 * corner raised, warmed by a lamp off to one side (an invented smooth field, rounded to 0.1 °C), and the
 * same four lying flat for the lesson of the flat formation.
 */

export type FourPointSampleFormation = 'tetrahedron' | 'flat';

/** Where the sample lamp's bulb is, cm, and the room temperature, °C (invented). */
const LAMP_CM = [-30, 20, 35] as const;
const ROOM_C = 21;
/** How much the lamp warms a point at 10 cm, °C; it falls as 1/distance² (an invented smooth field). */
const WARMING_AT_10_CM_C = 40;
/** Height of the raised corner, cm. */
export const FOUR_POINT_SAMPLE_RAISE_CM = 30;

/** Four labelled sensors with positions (cm) and temperatures (°C to 0.1). */
export function fourPointSample(
  formation: FourPointSampleFormation,
): { label: string; positionCm: [number, number, number]; value: number }[] {
  const raise = formation === 'tetrahedron' ? FOUR_POINT_SAMPLE_RAISE_CM : 0;
  const spots: [string, [number, number, number]][] = [
    ['A', [0, 0, 0]],
    ['B', [40, 0, 0]],
    ['C', [40, 40, 0]],
    ['D', [0, 40, raise]],
  ];
  return spots.map(([label, p]) => {
    const d2 = (p[0] - LAMP_CM[0]) ** 2 + (p[1] - LAMP_CM[1]) ** 2 + (p[2] - LAMP_CM[2]) ** 2;
    const value = ROOM_C + (WARMING_AT_10_CM_C * 100) / d2;
    return { label, positionCm: p, value: Math.round(value * 10) / 10 };
  });
}
