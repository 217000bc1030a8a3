import { pgEnum } from 'drizzle-orm/pg-core';
import {
  boardSides,
  componentKinds,
  importJobStatuses,
  netKinds,
  netlistFormats,
  powerLinkKinds,
  powerLinkOrigins,
} from '@railyard/shared';

export const netKindEnum = pgEnum('net_kind', netKinds);
export const componentKindEnum = pgEnum('component_kind', componentKinds);
export const boardSideEnum = pgEnum('board_side', boardSides);
export const powerLinkKindEnum = pgEnum('power_link_kind', powerLinkKinds);
export const powerLinkOriginEnum = pgEnum('power_link_origin', powerLinkOrigins);
export const importJobStatusEnum = pgEnum('import_job_status', importJobStatuses);
export const netlistFormatEnum = pgEnum('netlist_format', netlistFormats);
