// maxrects-packer's "main" is a UMD file that Node's ESM loader cannot read, and its "types" omit
// MaxRectsBin; its ESM build and full declarations are imported by path instead.
declare module 'maxrects-packer/dist/maxrects-packer.mjs' {
  export { MaxRectsBin, Rectangle } from 'maxrects-packer/dist/index';
}
