export * from './enums';
export * from './boards';
export * from './imports';
export * from './users';
