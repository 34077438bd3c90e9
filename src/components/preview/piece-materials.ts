import { DoubleSide, LineBasicMaterial, MeshStandardMaterial } from 'three';

/**
 * Materials shared by every piece, created once at module load (never per frame or per render): pieces
 * already built are paper, the current step's pieces teal with amber glue tabs, later steps a faint ghost.
 */
export const PIECE_MATERIALS = {
  built: new MeshStandardMaterial({
    color: '#f4efe2',
    side: DoubleSide,
    roughness: 0.9,
    polygonOffset: true,
    polygonOffsetFactor: 1,
    polygonOffsetUnits: 1,
  }),
  current: new MeshStandardMaterial({
    color: '#2fa395',
    side: DoubleSide,
    roughness: 0.8,
    polygonOffset: true,
    polygonOffsetFactor: 1,
    polygonOffsetUnits: 1,
  }),
  later: new MeshStandardMaterial({
    color: '#c9ced8',
    side: DoubleSide,
    roughness: 1,
    transparent: true,
    opacity: 0.25,
    depthWrite: false,
  }),
  tab: new MeshStandardMaterial({ color: '#e3a33b', side: DoubleSide, roughness: 0.8 }),
  edge: new LineBasicMaterial({ color: '#1b2330' }),
  edgeLater: new LineBasicMaterial({ color: '#6b7482', transparent: true, opacity: 0.35 }),
} as const;

/**
 * A rod (straw, skewer, dowel) that stands in for a boom too thin for paper: wood-coloured and matt once
 * glued on, teal like the current piece at its own step, a faint ghost before it.
 */
export const ROD_MATERIALS = {
  built: new MeshStandardMaterial({ color: '#c8a46a', roughness: 0.7 }),
  current: PIECE_MATERIALS.current,
  later: PIECE_MATERIALS.later,
} as const;
