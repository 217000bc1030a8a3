export * from './board-draft';
// readers and writers of netlist files
export * from './ipc-d-356-reader';
export * from './ipc-d-356-writer';
export * from './pin-list-csv-reader';
export * from './parts-csv-reader';
export * from './board-file-reader';
export * from './netlist-format';
// board analysis
export * from './value-code';
export * from './refdes-kind';
export * from './net-name';
export * from './ground-nets';
export * from './derive-power-links';
export * from './root-net';
export * from './assemble-board';
export * from './carry-over-annotations';
export * from './power-graph';
export * from './rail-loads';
export * from './coupled-groups';
export * from './placement';
