// Minimal types for the part of pngjs the browser tests use (the package ships none).
declare module "pngjs" {
  export const PNG: { sync: { read(buffer: Buffer): { width: number; height: number; data: Buffer } } };
}
