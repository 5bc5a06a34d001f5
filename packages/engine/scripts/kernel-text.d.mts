export interface KernelModule {
  wat: string;
  ts: string;
  constant: string;
  what: string;
}
export const KERNEL_MODULES: KernelModule[];
export function compileKernelText(wat: string, name?: string): Promise<Uint8Array>;
export function kernelModuleSource(bytes: Uint8Array, kernel?: KernelModule): string;
