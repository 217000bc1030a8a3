import { describe, expect, it } from 'vitest';
import { isGroundNetName, isPowerRailName, normalizeNetName } from './net-name';

describe('normalizeNetName', () => {
  it('gives the same key to one rail written with different case and separators', () => {
    expect(normalizeNetName('vcc_3v3')).toBe('VCC3V3');
    expect(normalizeNetName('VCC-3V3')).toBe('VCC3V3');
    expect(normalizeNetName('Vcc 3V3')).toBe('VCC3V3');
    expect(normalizeNetName('VCC.3V3')).toBe('VCC3V3');
    expect(normalizeNetName('VCC/3V3')).toBe('VCC3V3');
    expect(normalizeNetName('  vcc_3v3 ')).toBe('VCC3V3');
  });

  it('drops other punctuation such as the $ and brackets of generated names', () => {
    expect(normalizeNetName('N$12')).toBe('N12');
    expect(normalizeNetName('DATA[3]')).toBe('DATA3');
  });

  it('drops a leading + because +3V3 and 3V3 are the same rail', () => {
    expect(normalizeNetName('+3V3')).toBe(normalizeNetName('3V3'));
  });

  it('keeps the sign of a negative rail', () => {
    expect(normalizeNetName('-12V')).toBe('-12V');
    expect(normalizeNetName('-12V')).not.toBe(normalizeNetName('12V'));
  });

  it('keeps the two halves of a pair and a terminal polarity apart', () => {
    expect(normalizeNetName('USB_D+')).toBe('USBD+');
    expect(normalizeNetName('USB_D-')).toBe('USBD-');
    expect(normalizeNetName('usb_d-_conn')).toBe('USBD-CONN');
    expect(normalizeNetName('BAT+')).not.toBe(normalizeNetName('BAT-'));
  });

  it('keeps active-low marks', () => {
    expect(normalizeNetName('RESET#')).toBe('RESET#');
    expect(normalizeNetName('RESET#')).not.toBe(normalizeNetName('RESET'));
  });
});

// Net naming has no standard; these are common practice on logic boards.
describe('isGroundNetName', () => {
  it.each([
    'GND',
    'gnd',
    'AGND',
    'DGND',
    'PGND',
    'SGND',
    'CHGND',
    'GNDA',
    'GND2',
    'GND_USB',
    'USB_GND',
    'PGND_BUCK1',
    'VSS',
    'VSSA',
    'AVSS',
    '0V',
    'GROUND',
    'EARTH',
  ])('recognises %s as ground (common practice)', (name) => {
    expect(isGroundNetName(name)).toBe(true);
  });

  it.each([
    'GNDSENSE',
    'GND_SENSE',
    'VSS_SNS',
    'GND_DET',
    'CHASSIS_DET',
    'VCC_3V3',
    'VDD_CPU',
    '0V8',
    'N12',
    'SIGNAL',
  ])('does not take %s for ground (common practice)', (name) => {
    expect(isGroundNetName(name)).toBe(false);
  });
});

describe('isPowerRailName', () => {
  it.each([
    'VBAT',
    'VBATT',
    'BAT',
    'VSYS',
    'VCC',
    'VCC_3V3',
    'VCC3V3',
    'VDD_CPU',
    'AVDD',
    'DVDD_1V8',
    'VDDQ',
    'PVIN',
    'USB_VBUS',
    '3V3',
    '+5V',
    '12V',
    '1V8',
    'V1V8',
    '3.3V',
    '1V05_AUX',
  ])('recognises %s as a power rail (common practice)', (name) => {
    expect(isPowerRailName(name)).toBe(true);
  });

  it.each([
    'GND',
    '0V',
    'VCC_3V3_EN',
    'VBUS_DET',
    'VBAT_SNS',
    'VDD_CPU_PG',
    '3V3_LDO_FEEDBACK_DIVIDER',
    'BAT_ID',
    'BATT_TEMP',
    'VREF',
    'I2C_SDA',
    'USB_D+',
    'N12',
  ])('does not take %s for a power rail (common practice)', (name) => {
    expect(isPowerRailName(name)).toBe(false);
  });
});
