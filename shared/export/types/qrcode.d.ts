// The part of qrcode that shared/ uses, for tsconfig.shared.json only. @types/qrcode begins with
// `/// <reference types="node" />`, which would bring Node's globals into shared/ and let a Node-only API
// pass the platform-free check unnoticed. tsconfig.server.json compiles the same calls against the
// package's own types, so a mismatch here still fails a type check.
export type QRCodeErrorCorrectionLevel = 'low' | 'medium' | 'quartile' | 'high' | 'L' | 'M' | 'Q' | 'H';

export interface QRCodeOptions {
  version?: number;
  errorCorrectionLevel?: QRCodeErrorCorrectionLevel;
}

export interface BitMatrix {
  size: number;
  data: Uint8Array;
  get(row: number, col: number): number;
}

export interface QRCode {
  modules: BitMatrix;
  version: number;
}

export function create(text: string, options?: QRCodeOptions): QRCode;

declare const QRCodeModule: { create: typeof create };
export default QRCodeModule;
