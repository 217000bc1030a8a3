// A small pin-list board with positions worked by hand, for the placement API and the board drawings.
import type { TestApp } from './test-app';
import { importPinList } from './pin-list-board';

/** refdes, pin, net, x, y (mm), side: about 40 × 20 mm; H1 has no position. */
export const placedBoardRows = [
  'J1,1,GND,0,0,top',
  'J1,2,VBAT,0,2.5,top',
  'U1,1,VBAT,20,10,top',
  'U1,2,VSYS,24,14,top',
  'U1,3,GND,22,12,top',
  'C1,1,VSYS,39,19,bottom',
  'C1,2,GND,40,19,bottom',
  'H1,1,GND,,,',
];

export async function importPlacedBoard(app: TestApp, slug: string) {
  const admin = await app.agentAs('admin');
  const csv = ['refdes,pin,net,x,y,side', ...placedBoardRows].join('\n');
  await importPinList(admin, slug, csv);
}
