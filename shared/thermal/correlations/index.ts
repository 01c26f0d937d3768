export * from './laminar';
export * from './turbulent';
export * from './transition';
export * from './corrections';
export * from './methods';
export * from './select';
