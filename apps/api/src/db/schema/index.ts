export * from './enums';
export * from './boards';
export * from './imports';
export * from './users';
export * from './casebook';
export * from './attachments';
export * from './notifications';
