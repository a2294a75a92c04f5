// heic-decode ships no types; this declares the call we make.
declare module 'heic-decode' {
  type Decoded = { width: number; height: number; data: Uint8ClampedArray };
  function decode(input: { buffer: Buffer | ArrayBuffer }): Promise<Decoded>;
  export default decode;
}
