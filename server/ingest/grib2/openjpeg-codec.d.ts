// Types for the parts of @cornerstonejs/codec-openjpeg's decoder build that unpack-jpeg2000.ts uses
// (the package ships no declarations).
declare module "@cornerstonejs/codec-openjpeg/decodewasmjs" {
  export interface OpenJpegFrameInfo {
    width: number;
    height: number;
    bitsPerSample: number;
    componentCount: number;
    isSigned: boolean;
  }
  export interface OpenJpegDecoder {
    getEncodedBuffer(length: number): Uint8Array;
    getDecodedBuffer(): Uint8Array;
    decode(): void;
    getFrameInfo(): OpenJpegFrameInfo;
    delete(): void;
  }
  export interface OpenJpegModule {
    J2KDecoder: new () => OpenJpegDecoder;
  }
  const createOpenJpegModule: (options?: { print?: (text: string) => void; printErr?: (text: string) => void }) => Promise<OpenJpegModule>;
  export default createOpenJpegModule;
}
