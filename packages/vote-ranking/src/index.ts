export * from './wilson-score';
export * from './case-evidence';
export * from './reputation';
