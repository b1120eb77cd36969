// Types for the part of pngjs 7 that mask-png.ts uses (the package ships no declarations).
declare module "pngjs" {
  export class PNG {
    constructor(options: { width: number; height: number });
    width: number;
    height: number;
    /** RGBA, 4 bytes per pixel, rows top to bottom. */
    data: Buffer;
    static sync: { write(png: PNG): Buffer; read(buffer: Buffer): PNG };
  }
  const pngjs: { PNG: typeof PNG };
  export default pngjs;
}
