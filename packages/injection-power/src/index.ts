export * from './supply-into-short';
