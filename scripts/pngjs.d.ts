// The part of pngjs (a dependency of the Expo toolchain, not one of ours) that scripts/make-icons.ts uses.
declare module 'pngjs' {
  export class PNG {
    constructor(options: { width: number; height: number });
    data: Buffer;
    static sync: { write(png: PNG): Buffer };
  }
}
