export type ElectronRuntime = { available: true; executable: string } | { available: false; reason: string };

export function electronRuntime(where?: { packageDir?: string | null; env?: Record<string, string | undefined> }): ElectronRuntime;
