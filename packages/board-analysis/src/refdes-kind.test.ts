import { describe, expect, it } from 'vitest';
import { inferComponentKind, refdesPrefix } from './refdes-kind';

describe('refdesPrefix', () => {
  it('takes the letters before the first digit, upper-cased', () => {
    expect(refdesPrefix('C12')).toBe('C');
    expect(refdesPrefix('fb3')).toBe('FB');
    expect(refdesPrefix('TP_4')).toBe('TP');
    expect(refdesPrefix('U1A')).toBe('U');
    expect(refdesPrefix('42')).toBe('');
  });
});

describe('inferComponentKind', () => {
  // IEEE 315 / ASME Y14.44 reference designator class letters, from memory
  it.each([
    ['C1', 'capacitor'],
    ['R22', 'resistor'],
    ['RT1', 'resistor'],
    ['L3', 'inductor'],
    ['F1', 'fuse'],
    ['D4', 'diode'],
    ['CR2', 'diode'],
    ['U7', 'ic'],
    ['J2', 'connector'],
    ['P1', 'connector'],
    ['Y1', 'crystal'],
    ['TP12', 'testpoint'],
  ])('reads %s as %s (IEEE 315 class letter)', (refdes, kind) => {
    expect(inferComponentKind(refdes)).toBe(kind);
  });

  // common practice on logic boards, not in IEEE 315
  it.each([
    ['RN1', 'resistor'],
    ['RA4', 'resistor'],
    ['FB2', 'ferrite'],
    ['FL1', 'ferrite'],
    ['IC3', 'ic'],
    ['CN5', 'connector'],
    ['CON2', 'connector'],
    ['X1', 'crystal'],
    ['TVS1', 'tvs'],
    ['ESD3', 'tvs'],
    ['ZD1', 'tvs'],
    ['LED2', 'diode'],
    ['TR1', 'transistor'],
  ])('reads %s as %s (common practice)', (refdes, kind) => {
    expect(inferComponentKind(refdes)).toBe(kind);
  });

  it('reads Q as a MOSFET, because most Q parts on logic boards are MOSFET switches (common practice)', () => {
    expect(inferComponentKind('Q5')).toBe('mosfet');
  });

  it('reads a varistor (IEEE 315 RV) as a suppressor', () => {
    expect(inferComponentKind('RV1')).toBe('tvs');
  });

  it('leaves VR as other, since it names a regulator in IEEE 315 and a variable resistor elsewhere', () => {
    expect(inferComponentKind('VR1')).toBe('other');
  });

  it('reads the power-section prefixes of notebook boards by the letter after the P (common practice)', () => {
    expect(inferComponentKind('PC101')).toBe('capacitor');
    expect(inferComponentKind('PR12')).toBe('resistor');
    expect(inferComponentKind('PL3')).toBe('inductor');
    expect(inferComponentKind('PQ7')).toBe('mosfet');
    expect(inferComponentKind('PU2')).toBe('ic');
    expect(inferComponentKind('PJ1')).toBe('other');
  });

  it('ignores case', () => {
    expect(inferComponentKind('c7')).toBe('capacitor');
    expect(inferComponentKind('fb1')).toBe('ferrite');
  });

  it.each(['JP1', 'SW2', 'K1', 'BT1', 'T3', 'M1', 'H4', 'MH1', '12', ''])(
    'reads %j as other',
    (refdes) => {
      expect(inferComponentKind(refdes)).toBe('other');
    },
  );
});
