/**
 * The nets of the cube, found here without the unfolder: every free hexomino (grown cell by cell, kept once
 * under the eight turns and mirrors of the square grid), kept when rolling a cube across its cells puts a
 * different cube face down on each cell (a die rolled over the net). A known fact of geometry gives the
 * counts to check against: 35 free hexominoes, 11 of them cube nets.
 */
type Cell = readonly [number, number];

/** The canonical form of a set of grid cells under rotation and reflection. */
export function polyominoCanonical(cells: readonly Cell[]): string {
  const forms: string[] = [];
  for (let r = 0; r < 8; r++) {
    const moved = cells.map(([x, y]) => {
      let [u, v] = r & 4 ? [-x, y] : [x, y];
      for (let k = 0; k < (r & 3); k++) [u, v] = [-v, u];
      return [u, v] as const;
    });
    const minX = Math.min(...moved.map((c) => c[0])),
      minY = Math.min(...moved.map((c) => c[1]));
    forms.push(
      moved
        .map(([x, y]) => [x - minX, y - minY])
        .sort((a, b) => a[0]! - b[0]! || a[1]! - b[1]!)
        .map((c) => c.join(','))
        .join(' '),
    );
  }
  return forms.sort()[0]!;
}

export function freePolyominoes(size: number): Cell[][] {
  let level = new Map<string, Cell[]>([['0,0', [[0, 0]]]]);
  for (let n = 1; n < size; n++) {
    const next = new Map<string, Cell[]>();
    for (const cells of level.values()) {
      const taken = new Set(cells.map((c) => c.join(',')));
      for (const [x, y] of cells)
        for (const [dx, dy] of [
          [1, 0],
          [-1, 0],
          [0, 1],
          [0, -1],
        ] as const) {
          const c: Cell = [x + dx, y + dy];
          if (taken.has(c.join(','))) continue;
          const grown = [...cells, c];
          next.set(polyominoCanonical(grown), grown);
        }
    }
    level = next;
  }
  return [...level.values()];
}

/** Faces of a die: down, up, north (+y), south, east (+x), west. Rolling east brings west down, and so on. */
function rollsToCube(cells: readonly Cell[]): boolean {
  const start = { d: 0, u: 1, n: 2, s: 3, e: 4, w: 5 };
  const at = new Map<string, typeof start>([[cells[0]!.join(','), start]]);
  const queue: Cell[] = [cells[0]!];
  const inNet = new Set(cells.map((c) => c.join(',')));
  while (queue.length > 0) {
    const [x, y] = queue.shift()!;
    const f = at.get(`${x},${y}`)!;
    const moves: [number, number, typeof start][] = [
      [1, 0, { d: f.e, u: f.w, n: f.n, s: f.s, e: f.u, w: f.d }],
      [-1, 0, { d: f.w, u: f.e, n: f.n, s: f.s, e: f.d, w: f.u }],
      [0, 1, { d: f.n, u: f.s, n: f.u, s: f.d, e: f.e, w: f.w }],
      [0, -1, { d: f.s, u: f.n, n: f.d, s: f.u, e: f.e, w: f.w }],
    ];
    for (const [dx, dy, g] of moves) {
      const key = `${x + dx},${y + dy}`;
      if (!inNet.has(key) || at.has(key)) continue;
      at.set(key, g);
      queue.push([x + dx, y + dy]);
    }
  }
  return new Set([...at.values()].map((f) => f.d)).size === 6;
}

export const CUBE_NETS = new Set(freePolyominoes(6).filter(rollsToCube).map(polyominoCanonical));
