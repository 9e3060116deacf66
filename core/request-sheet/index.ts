export * from './cells';
export * from './fields';
export * from './guess';
export * from './mapping';
export * from './preview';
export { readRequestRow } from './row';
