/**
 * STL reading, binary and ASCII. Binary STL: an 80-byte header, a little-endian uint32 triangle count, then
 * 50 bytes per triangle (normal, three vertices as float32 x, y, z, a uint16 attribute). ASCII STL:
 * `solid name`, then per triangle `facet normal i j k` / `outer loop` / three `vertex x y z` / `endloop` /
 * `endfacet`, and `endsolid`. Both layouts as in the format's original definition (3D Systems, "StereoLithography
 * Interface Specification", 1989; from memory). The triangle limit is checked before any triangle is read.
 */
import { InputError } from '../errors';
import { MESH_TRIANGLES_MAX } from './mesh-limits';
import type { ParsedMesh } from './mesh-types';

const HEADER_BYTES = 84;
const TRIANGLE_BYTES = 50;

/** Reads an STL file, binary or ASCII; InputError naming the problem for anything malformed. */
export function stlParse(bytes: Uint8Array): ParsedMesh {
  if (bytes.length === 0) throw new InputError('The file is empty (0 bytes).');
  if (stlLooksAscii(bytes)) return stlParseAscii(bytes);
  return stlParseBinary(bytes);
}

/**
 * ASCII when it starts with `solid` and is not exactly the length a binary file with its header's count
 * would have (some programs write "solid" at the start of a binary header).
 */
function stlLooksAscii(bytes: Uint8Array): boolean {
  const start = new TextDecoder().decode(bytes.subarray(0, Math.min(bytes.length, 6))).trimStart();
  if (!start.startsWith('solid')) return false;
  if (bytes.length < HEADER_BYTES) return true;
  const count = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength).getUint32(80, true);
  return HEADER_BYTES + count * TRIANGLE_BYTES !== bytes.length;
}

function stlParseBinary(bytes: Uint8Array): ParsedMesh {
  if (bytes.length < HEADER_BYTES)
    throw new InputError(
      `This binary STL is ${bytes.length} bytes, shorter than the ${HEADER_BYTES}-byte header and triangle count.`,
    );
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const count = view.getUint32(80, true);
  if (count > MESH_TRIANGLES_MAX)
    throw new InputError(
      `This STL declares ${count.toLocaleString('en-US')} triangles; the most a kit can take is ${MESH_TRIANGLES_MAX.toLocaleString('en-US')}. Simplify the mesh first.`,
    );
  const expected = HEADER_BYTES + count * TRIANGLE_BYTES;
  if (bytes.length !== expected)
    throw new InputError(
      bytes.length < expected
        ? `This binary STL is cut short: its header says ${count} triangles (${expected} bytes) but the file has ${bytes.length} bytes.`
        : `This binary STL's triangle count (${count}, ${expected} bytes) disagrees with the file length (${bytes.length} bytes).`,
    );
  if (count === 0) throw new InputError('This STL has no triangles.');
  const positions = new Float64Array(count * 9);
  for (let t = 0; t < count; t++) {
    const at = HEADER_BYTES + t * TRIANGLE_BYTES + 12;
    for (let k = 0; k < 9; k++) {
      const v = view.getFloat32(at + k * 4, true);
      if (!Number.isFinite(v))
        throw new InputError(`Triangle ${t + 1} of this STL has a coordinate that is not a finite number (${v}).`);
      positions[t * 9 + k] = v;
    }
  }
  return soupMesh(positions, headerName(bytes));
}

function headerName(bytes: Uint8Array): string {
  const text = new TextDecoder('latin1').decode(bytes.subarray(0, 80));
  const printable = text.replace(/[^\x20-\x7e]/g, ' ').trim();
  return printable.startsWith('solid') ? printable.slice(5).trim() : '';
}

/** ASCII STL, read token by token as a small state machine so that a missing keyword is named with its line. */
function stlParseAscii(bytes: Uint8Array): ParsedMesh {
  const text = new TextDecoder().decode(bytes);
  const coords: number[] = [];
  let name = '';
  let state: 'solid' | 'facet' | 'loop' | 'vertex' | 'endloop' | 'endfacet' | 'end' = 'solid';
  let vertices = 0;
  let lineNo = 0;
  let triangles = 0;
  let pos = 0;
  const fail = (what: string): never => {
    throw new InputError(`This ASCII STL is malformed at line ${lineNo}: ${what}.`);
  };
  while (pos < text.length) {
    let end = text.indexOf('\n', pos);
    if (end < 0) end = text.length;
    const line = text.slice(pos, end).trim();
    pos = end + 1;
    lineNo++;
    if (line === '') continue;
    const words = line.split(/\s+/);
    const word = words[0]!.toLowerCase();
    switch (state) {
      case 'solid':
        if (word !== 'solid') fail(`expected "solid", found "${words[0]}"`);
        name = words.slice(1).join(' ');
        state = 'facet';
        break;
      case 'facet':
        if (word === 'endsolid') {
          state = 'end';
          break;
        }
        if (word !== 'facet') fail(`expected "facet" or "endsolid", found "${words[0]}"`);
        if (++triangles > MESH_TRIANGLES_MAX)
          throw new InputError(
            `This STL has more than ${MESH_TRIANGLES_MAX.toLocaleString('en-US')} triangles, the most a kit can take. Simplify the mesh first.`,
          );
        state = 'loop';
        break;
      case 'loop':
        if (word !== 'outer' || words[1]?.toLowerCase() !== 'loop') fail(`expected "outer loop", found "${line}"`);
        state = 'vertex';
        vertices = 0;
        break;
      case 'vertex':
        if (word !== 'vertex') fail(`expected "vertex" (3 per facet), found "${words[0]}"`);
        if (words.length !== 4) fail('a vertex needs exactly three coordinates');
        for (let k = 1; k <= 3; k++) coords.push(finiteNumber(words[k]!, lineNo));
        if (++vertices === 3) state = 'endloop';
        break;
      case 'endloop':
        if (word !== 'endloop') fail(`expected "endloop" after three vertices, found "${words[0]}"`);
        state = 'endfacet';
        break;
      case 'endfacet':
        if (word !== 'endfacet') fail(`expected "endfacet", found "${words[0]}"`);
        state = 'facet';
        break;
      case 'end':
        if (word === 'solid') {
          state = 'facet';
          break;
        }
        fail(`unexpected "${words[0]}" after "endsolid"`);
    }
  }
  if (state !== 'end') {
    lineNo++;
    fail(state === 'solid' ? 'the file has no "solid" line' : 'the file ends before "endsolid"');
  }
  if (triangles === 0) throw new InputError('This STL has no triangles.');
  return soupMesh(Float64Array.from(coords), name);
}

/** A number token; InputError on anything that is not finite (nan, inf, 1e999, text). */
export function finiteNumber(word: string, lineNo: number): number {
  const v = Number(word);
  if (!Number.isFinite(v))
    throw new InputError(`Line ${lineNo} has a coordinate "${word}" that is not a finite number.`);
  return v;
}

/** Each triangle its own three vertices (welding joins them later). */
function soupMesh(positions: Float64Array, name: string): ParsedMesh {
  const count = positions.length / 9;
  const triangles = new Uint32Array(count * 3);
  for (let i = 0; i < triangles.length; i++) triangles[i] = i;
  return { positions, triangles, triangleGroup: new Uint16Array(count), groups: [name || 'Mesh'] };
}
