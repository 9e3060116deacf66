export { ApiProvider, useApi, usePlatform } from './context';
export { createHttpApi } from './http';
export { createIpcApi } from './ipc';
export { createPlatform, mountPoint } from './platform';
export type { Platform } from './platform';
export { shellBridge } from './bridge';
