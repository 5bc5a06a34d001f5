export function compileKernelText(wat: string): Promise<Uint8Array>;
export function kernelModuleSource(bytes: Uint8Array): string;
