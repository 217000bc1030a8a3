// Shared set-up of the casebook API tests: a small board of their own and a valid write-up to vary.
import { expect } from 'vitest';
import type { CaseDetail } from '@railyard/shared';
import { importPinList } from '../support/pin-list-board';
import { uniqueSlug, type TestApp } from '../support/test-app';

type Agent = Awaited<ReturnType<TestApp['agentAs']>>;

/** A battery-fed board: VBAT → U1 (switch) → VSYS → U2 (buck) → VCC_1V8, with decoupling and an I2C sensor. */
export async function casebookBoard(t: TestApp, prefix = 'cases'): Promise<string> {
  const slug = uniqueSlug(prefix);
  const admin = await t.agentAs('admin');
  const csv = [
    'refdes,pin,net',
    'J1,1,GND', 'J1,2,VBAT',
    'U1,1,VBAT', 'U1,2,VSYS', 'U1,3,GND',
    'C1,1,VSYS', 'C1,2,GND',
    'C2,1,VSYS', 'C2,2,GND',
    'U2,1,VSYS', 'U2,2,VCC_1V8', 'U2,3,GND',
    'C3,1,VCC_1V8', 'C3,2,GND',
    'R1,1,VCC_1V8', 'R1,2,I2C_SDA',
    'U3,1,VCC_1V8', 'U3,2,I2C_SDA', 'U3,3,GND',
  ].join('\n');
  const annotations = JSON.stringify({
    format: 'railyard-annotations',
    version: 1,
    rootNet: 'VBAT',
    nets: [{ name: 'VSYS', kind: 'power', nominalVoltage: 3.85, aliases: ['SYS'] }],
    powerLinks: [{ from: 'VSYS', to: 'VCC_1V8', via: 'U2', kind: 'converter' }],
  });
  await importPinList(admin, slug, csv, { annotations });
  return slug;
}

/** A complete, valid write-up; tests override what they are about. */
export function caseInput(overrides: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    status: 'published',
    title: 'No boot, VSYS shorted to ground',
    symptom: 'Dead on the bench supply, draws 2 A at once',
    rootCause: 'C1 cracked and shorted VSYS to ground',
    fixSteps: '1. Disconnect the battery.\n2. Find the hot part with limited current.\n3. Replace C1.',
    body: 'Found C1 warm within seconds.',
    outcome: 'solved',
    minutesSpent: 40,
    readings: [{ net: 'VSYS', mode: 'diode_v', measured: 0.003, knownGood: 0.38 }],
    nets: ['VSYS'],
    components: [{ refdes: 'C1', culprit: true }],
    ...overrides,
  };
}

export async function writeCase(agent: Agent, slug: string, overrides: Record<string, unknown> = {}): Promise<CaseDetail> {
  const res = await agent.post(`/api/boards/${slug}/cases`).send(caseInput(overrides));
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.case as CaseDetail;
}

/** Several signed-in members, made one after the other (each signs in through the fake GitHub). */
export async function members(t: TestApp, count: number): Promise<Agent[]> {
  const agents: Agent[] = [];
  for (let i = 0; i < count; i++) agents.push(await t.agentAs('member'));
  return agents;
}
