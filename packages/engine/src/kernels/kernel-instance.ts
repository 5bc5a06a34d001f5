import "./webassembly-globals.js";

const modules = new Map<string, WebAssembly.Module>();
const instances = new WeakMap<WebAssembly.Memory, Map<string, Record<string, unknown>>>();

/**
 * The exports of the WebAssembly module whose bytes are `base64`, instantiated over `memory`:
 * one instance per module, memory and thread (an instance is not shared between threads;
 * the memory is), each module compiled once per thread. Compiling takes well under a
 * millisecond. Callers type the exports by the module's text (member-kernels.ts, random-kernels.ts).
 */
export function kernelInstance(base64: string, memory: WebAssembly.Memory): Record<string, unknown> {
  let byModule = instances.get(memory);
  if (!byModule) {
    byModule = new Map<string, Record<string, unknown>>();
    instances.set(memory, byModule);
  }
  let exports = byModule.get(base64);
  if (!exports) {
    let compiled = modules.get(base64);
    if (!compiled) {
      compiled = new WebAssembly.Module(decodeBase64(base64));
      modules.set(base64, compiled);
    }
    exports = new WebAssembly.Instance(compiled, { env: { memory } }).exports;
    byModule.set(base64, exports);
  }
  return exports;
}

function decodeBase64(text: string): Uint8Array {
  const binary = atob(text);
  const bytes = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
  return bytes;
}
