export * from './organizations';
export * from './users';
export * from './auth-tokens';
export * from './sessions';
export * from './quotes';
export * from './price-books';
export * from './orders';
export * from './mail';
