export * from './tubes';
export * from './materials';
export * from './shells';
export * from './layout';
