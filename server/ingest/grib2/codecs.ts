import type { OpenJpegModule } from "@cornerstonejs/codec-openjpeg/decodewasmjs";

/**
 * The JPEG 2000 codec is a WebAssembly module that can only be instantiated asynchronously. Call
 * loadGrib2Codecs() once before decoding files that may use template 5.40; every other template decodes
 * without it.
 */
let openJpeg: OpenJpegModule | null = null;
let loading: Promise<void> | null = null;

export function loadGrib2Codecs(): Promise<void> {
  loading ??= import("@cornerstonejs/codec-openjpeg/decodewasmjs").then(async (module) => {
    // The codec logs progress lines through print/printErr; keep them out of the server's output.
    const quiet = () => {};
    openJpeg = await module.default({ print: quiet, printErr: quiet });
  });
  return loading;
}

export function loadedOpenJpeg(): OpenJpegModule | null {
  return openJpeg;
}
