import { caseCreateSchema, caseUpdateSchema, type CaseDetail } from '@railyard/shared';
import { describe, expect, it } from 'vitest';
import {
  caseChanges,
  caseFormFrom,
  emptyCaseForm,
  newReadingRow,
  partError,
  unknownNetErrors,
  payloadOf,
  readCaseForm,
  type CaseForm,
} from './case-form';

function filledForm(): CaseForm {
  return {
    ...emptyCaseForm({ nets: ['VSYS'], parts: ['C1013'] }),
    title: '  Dead board, VSYS shorted to ground ',
    symptom: 'No current draw on the bench supply.',
    outcome: 'solved',
    minutes: '1:10',
    fixSteps: 'Battery disconnected. Injected 1 V at 2 A, C1013 warmed.',
    parts: [
      { refdes: 'C1013', culprit: true },
      { refdes: 'U1001', culprit: false },
    ],
    readings: [
      { ...newReadingRow('VSYS'), mode: 'diode_v', measured: '0,004', knownGood: '0.336' },
      { ...newReadingRow('VSYS'), mode: 'resistance_ohm', measured: '1R5', knownGood: '4K7' },
    ],
  };
}

// An answer of GET /api/cases/:id in the contract's shape (packages/shared/src/casebook.ts).
function detail(overrides: Partial<CaseDetail> = {}): CaseDetail {
  const person = { id: 7, login: 'demo-author', name: 'Demo Author' };
  return {
    id: 12,
    board: { slug: 'demo-board', title: 'Demo board' },
    status: 'published',
    title: 'Dead board, VSYS shorted to ground',
    symptom: 'No current draw on the bench supply.',
    outcome: 'solved',
    minutesSpent: 70,
    author: { ...person, reputation: 3 },
    nets: ['VSYS'],
    culprits: ['C1013'],
    commentCount: 0,
    score: {
      ups: 0,
      downs: 0,
      confirmations: 0,
      wilsonLowerBound: 0,
      myVote: null,
      confirmedByMe: false,
    },
    createdAt: '2025-03-01T10:00:00.000Z',
    updatedAt: '2025-03-01T10:00:00.000Z',
    publishedAt: '2025-03-01T10:00:00.000Z',
    rootCause: '',
    fixSteps: 'Replaced C1013.',
    body: '',
    html: { rootCause: '', fixSteps: '<p>Replaced C1013.</p>', body: '' },
    readings: [{ position: 0, net: 'VSYS', mode: 'diode_v', measured: 0.004, knownGood: 0.336 }],
    components: [{ refdes: 'C1013', culprit: true }],
    ...overrides,
  };
}

describe('case form to API payload', () => {
  it('turns what was typed into a payload the API contract accepts', () => {
    const read = readCaseForm(filledForm(), 'published');
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    // the contract itself must take the payload unchanged
    expect(caseCreateSchema.parse(read.payload)).toEqual(read.payload);
    expect(read.payload.title).toBe('Dead board, VSYS shorted to ground');
    expect(read.payload.minutesSpent).toBe(70);
    expect(read.payload.status).toBe('published');
    // IEC 60062 letter code (shared/reference/FACTS.md §2): 1R5 = 1.5 Ω, 4K7 = 4.7 kΩ
    expect(read.payload.readings).toEqual([
      { net: 'VSYS', mode: 'diode_v', measured: 0.004, knownGood: 0.336 },
      { net: 'VSYS', mode: 'resistance_ohm', measured: 1.5, knownGood: 4700 },
    ]);
    expect(read.payload.components).toEqual([
      { refdes: 'C1013', culprit: true },
      { refdes: 'U1001', culprit: false },
    ]);
  });

  it('keys each problem by the field path the API uses in details.issues', () => {
    const form = filledForm();
    form.title = 'Dead';
    form.nets = ['VSYS', 'VSYS'];
    form.readings[1]!.measured = 'OL';
    form.readings[0]!.net = '';
    const read = readCaseForm(form, 'draft');
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(Object.keys(read.errors).sort()).toEqual([
      'nets.1',
      'readings.0.net',
      'readings.1.measured',
      'title',
    ]);
    expect(read.errors['readings.1.measured']).toMatch(/not a number/);
  });

  it('asks for the outcome and a measured value rather than sending blanks', () => {
    const form = filledForm();
    form.outcome = '';
    form.readings[0]!.measured = ' ';
    const read = readCaseForm(form, 'draft');
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(read.errors.outcome).toMatch(/how the repair ended/);
    expect(read.errors['readings.0.measured']).toMatch(/measured value/);
  });

  it('sends a blank known-good value as null', () => {
    const form = filledForm();
    form.readings[0]!.knownGood = '';
    const read = readCaseForm(form, 'draft');
    expect(read.ok && read.payload.readings[0]!.knownGood).toBeNull();
  });

  it('finds a part listed twice on its row, whichever side names it', () => {
    const form = filledForm();
    form.parts = [
      { refdes: 'C1013', culprit: true },
      { refdes: 'C1013', culprit: false },
    ];
    const read = readCaseForm(form, 'draft');
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(partError(read.errors, 1)).toMatch(/listed twice/);
    expect(partError({ 'components.0.refdes': 'not a part' }, 0)).toBe('not a part');
  });
});

describe('changes of an edited case', () => {
  it('sends nothing when the form comes back as it was loaded', () => {
    const original = detail();
    const read = readCaseForm(caseFormFrom(original), 'published');
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.payload).toEqual(payloadOf(original));
    expect(caseChanges(payloadOf(original), read.payload)).toEqual({});
  });

  it('sends only the fields that differ, and a changed list whole', () => {
    const original = detail();
    const form = caseFormFrom(original);
    form.symptom = 'Dead, no current draw at all.';
    form.parts = [...form.parts, { refdes: 'U1001', culprit: false }];
    const read = readCaseForm(form, 'published');
    if (!read.ok) throw new Error(JSON.stringify(read.errors));
    const change = caseChanges(payloadOf(original), read.payload);
    expect(change).toEqual({
      symptom: 'Dead, no current draw at all.',
      components: [
        { refdes: 'C1013', culprit: true },
        { refdes: 'U1001', culprit: false },
      ],
    });
    expect(caseUpdateSchema.safeParse(change).success).toBe(true);
  });

  it('sends the status only when a draft gets published', () => {
    const draft = payloadOf(detail({ status: 'draft' }));
    expect(caseChanges(draft, { ...draft, status: 'published' })).toEqual({ status: 'published' });
    const published = payloadOf(detail());
    expect(caseChanges(published, { ...published, status: 'draft' })).toEqual({});
  });
});

describe('nets the board does not have', () => {
  it('are named on their field before the API is asked', () => {
    const form = filledForm();
    form.nets = ['VSYS', 'VCC_MISSING'];
    form.readings[1]!.net = 'VBUS_TYPO';
    const boardNets = new Set(['VSYS', 'VBAT']);
    expect(unknownNetErrors(form, (name) => boardNets.has(name))).toEqual({
      'nets.1': 'VCC_MISSING is not a net of this board',
      'readings.1.net': 'VBUS_TYPO is not a net of this board',
    });
  });
});
