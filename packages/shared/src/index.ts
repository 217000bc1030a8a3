export * from './board';
export * from './board-file';
export * from './import';
export * from './api-error';
export * from './power-tree';
export * from './auth';
export * from './board-edits';
export * from './casebook';
