// Boards and their netlists: nets, aliases, components, pins, and the power links the power tree is built from.
import {
  boolean,
  doublePrecision,
  index,
  integer,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  type AnyPgColumn,
} from 'drizzle-orm/pg-core';
import { createdAt, id } from './columns';
import {
  boardSideEnum,
  componentKindEnum,
  netKindEnum,
  powerLinkKindEnum,
  powerLinkOriginEnum,
} from './enums';

export const boards = pgTable('boards', {
  id: id(),
  slug: text().notNull().unique(),
  title: text().notNull(),
  deviceFamily: text().notNull().default(''),
  boardNumber: text().notNull().default(''),
  revision: text().notNull().default(''),
  batteryVoltage: doublePrecision(),
  notes: text().notNull().default(''),
  rootNetId: integer().references((): AnyPgColumn => nets.id, { onDelete: 'set null' }),
  /** true when a person chose the root rather than the importer's detection */
  rootNetEntered: boolean().notNull().default(false),
  createdAt: createdAt(),
  updatedAt: timestamp({ withTimezone: true, mode: 'date' }).notNull().defaultNow(),
});

export const nets = pgTable(
  'nets',
  {
    id: id(),
    boardId: integer()
      .notNull()
      .references(() => boards.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    normalizedName: text().notNull(),
    kind: netKindEnum().notNull(),
    nominalVoltage: doublePrecision(),
    description: text().notNull().default(''),
  },
  (t) => [
    uniqueIndex('nets_board_name_key').on(t.boardId, t.name),
    index('nets_board_normalized_idx').on(t.boardId, t.normalizedName),
    // rail search (pg_trgm + btree_gin, created in migration 0001)
    index('nets_search_idx').using('gin', t.boardId, t.normalizedName.op('gin_trgm_ops')),
  ],
);

export const netAliases = pgTable(
  'net_aliases',
  {
    id: id(),
    boardId: integer()
      .notNull()
      .references(() => boards.id, { onDelete: 'cascade' }),
    netId: integer()
      .notNull()
      .references(() => nets.id, { onDelete: 'cascade' }),
    alias: text().notNull(),
    normalizedAlias: text().notNull(),
  },
  (t) => [
    uniqueIndex('net_aliases_board_alias_key').on(t.boardId, t.alias),
    index('net_aliases_net_idx').on(t.netId),
    index('net_aliases_search_idx').using('gin', t.boardId, t.normalizedAlias.op('gin_trgm_ops')),
  ],
);

export const components = pgTable(
  'components',
  {
    id: id(),
    boardId: integer()
      .notNull()
      .references(() => boards.id, { onDelete: 'cascade' }),
    refdes: text().notNull(),
    kind: componentKindEnum().notNull(),
    /** true when the kind came from a file or a person rather than the refdes prefix */
    kindEntered: boolean().notNull().default(false),
    value: text().notNull().default(''),
    magnitude: doublePrecision(),
    unit: text(),
    tolerance: doublePrecision(),
    ratedVoltage: doublePrecision(),
    package: text().notNull().default(''),
    side: boardSideEnum(),
    x: doublePrecision(),
    y: doublePrecision(),
    rotation: doublePrecision(),
  },
  (t) => [
    uniqueIndex('components_board_refdes_key').on(t.boardId, t.refdes),
    index('components_board_kind_idx').on(t.boardId, t.kind),
  ],
);

export const pins = pgTable(
  'pins',
  {
    id: id(),
    boardId: integer()
      .notNull()
      .references(() => boards.id, { onDelete: 'cascade' }),
    componentId: integer()
      .notNull()
      .references(() => components.id, { onDelete: 'cascade' }),
    pin: text().notNull(),
    netId: integer().references(() => nets.id, { onDelete: 'set null' }),
    x: doublePrecision(),
    y: doublePrecision(),
  },
  (t) => [
    uniqueIndex('pins_component_pin_key').on(t.componentId, t.pin),
    // per-net component lists and load counts
    index('pins_net_idx').on(t.netId, t.componentId),
    index('pins_board_idx').on(t.boardId),
  ],
);

export const powerLinks = pgTable(
  'power_links',
  {
    id: id(),
    boardId: integer()
      .notNull()
      .references(() => boards.id, { onDelete: 'cascade' }),
    fromNetId: integer()
      .notNull()
      .references(() => nets.id, { onDelete: 'cascade' }),
    toNetId: integer()
      .notNull()
      .references(() => nets.id, { onDelete: 'cascade' }),
    viaComponentId: integer().references(() => components.id, { onDelete: 'set null' }),
    /** refdes as entered, kept when a replaced netlist no longer has the part */
    viaRefdes: text().notNull(),
    kind: powerLinkKindEnum().notNull(),
    origin: powerLinkOriginEnum().notNull(),
    /** who entered the link: a user id, or "import:<file name>" */
    enteredBy: text(),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('power_links_edge_key').on(t.boardId, t.fromNetId, t.toNetId, t.viaRefdes),
    index('power_links_from_idx').on(t.fromNetId),
    index('power_links_to_idx').on(t.toNetId),
  ],
);
