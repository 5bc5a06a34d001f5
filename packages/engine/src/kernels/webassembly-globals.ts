/**
 * The part of the WebAssembly JavaScript API the engine uses. Node has the API, but its
 * types ship only in TypeScript's DOM library, which the engine does not load (it must not
 * reach for browser globals); these declarations match that library's.
 */
declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- the global WebAssembly namespace can only be augmented as a namespace
  namespace WebAssembly {
    interface MemoryDescriptor {
      initial: number;
      maximum?: number;
      shared?: boolean;
    }
    interface Memory {
      readonly buffer: ArrayBuffer | SharedArrayBuffer;
      grow(delta: number): number;
    }
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type -- an opaque handle, declared as TypeScript's DOM library declares it
    interface Module {}
    interface Instance {
      readonly exports: Record<string, unknown>;
    }
    const Memory: { new (descriptor: MemoryDescriptor): Memory };
    const Module: { new (bytes: Uint8Array): Module };
    const Instance: { new (module: Module, imports: Record<string, Record<string, unknown>>): Instance };
  }
}

export {};
