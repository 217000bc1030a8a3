// Net names as people type them differ in case and separators ("vcc_3v3", "VCC-3V3", "Vcc 3V3").
// This file gives the search key that makes them equal, and the name rules that recognise ground
// and power rails (common practice; there is no standard for net names).

/**
 * Case- and separator-insensitive key: upper-cased, letters and digits kept, separators and other
 * punctuation dropped (`_ - . / space $ ( ) [ ]` …). Kept because they change what the net is:
 * - `+` (BAT+, USB_D+), except a leading `+`, which only restates a positive rail (+3V3 = 3V3);
 * - `-` that starts a name before a digit (-12V is not 12V) or ends a word (BAT-, USB_D-_CONN),
 *   so a pair's two halves keep different keys; a `-` joining two words (VCC-3V3) is a separator;
 * - `#`, `~`, `!`, the active-low marks (RESET# is not RESET).
 */
export function normalizeNetName(name: string): string {
  const upper = name.trim().toUpperCase().replace(/^\++/, '');
  let key = '';
  for (let i = 0; i < upper.length; i++) {
    const ch = upper[i] ?? '';
    if (/[\p{L}\p{N}+#~!]/u.test(ch)) {
      key += ch;
    } else if (ch === '-') {
      const next = upper[i + 1];
      const leadingSign = i === 0 && next !== undefined && /\d/.test(next);
      const endsWord = next === undefined || next === '_' || next === '.' || next === '/';
      if (leadingSign || endsWord) key += ch;
    }
  }
  return key;
}

/** Upper-case words of a name, split at anything that is not a letter or digit. */
function nameWords(name: string): string[] {
  return name
    .toUpperCase()
    .split(/[^\p{L}\p{N}]+/u)
    .filter((word) => word !== '');
}

// GND, AGND, DGND, PGND, SGND, CGND, CHGND, GNDA, GND2, VSS, VSSA, AVSS, VSSQ …
const groundWordPattern = /^[A-Z]{0,2}(?:GND|VSS)[A-Z]?\d*$/;
const groundWords = new Set(['GROUND', 'EARTH', 'CHASSIS', '0V']);

// Words that turn a name about ground into a signal: a remote-sense or detect line that runs to
// ground is not ground (GND_SENSE, VSS_SNS, GND_DET). Written together (GNDSENSE), the word is not
// a ground word in the first place.
const groundSignalWords = new Set([
  'SENSE',
  'SNS',
  'SEN',
  'KELVIN',
  'DET',
  'DETECT',
  'FB',
  'ID',
  'EN',
  'SW',
  'CTRL',
  'CTL',
  'MON',
]);

/**
 * Ground by name (common practice): a word GND with up to two letters before it and one after
 * (AGND, DGND, PGND, GNDA), optionally numbered (GND2); VSS likewise (VSS is ground on logic
 * boards; in a ± analogue supply it can be the negative rail, which this does not tell apart);
 * GROUND, EARTH, CHASSIS, 0V. Words may sit anywhere (GND_USB, USB_GND). Not ground: a name that
 * also carries a sense/detect/enable word (GND_SENSE, GND_DET), GNDSENSE, and voltage words that
 * only start with 0V (0V8 is a 0.8 V rail).
 */
export function isGroundNetName(name: string): boolean {
  const words = nameWords(name);
  if (words.some((word) => groundSignalWords.has(word))) return false;
  return words.some((word) => groundWords.has(word) || groundWordPattern.test(word));
}

// VCC, VDD, AVDD, DVDD, VDDQ, PVIN, VBAT, VSYS, VBUS, VCORE, VCC3V3 …
const railWordPattern =
  /^[A-Z]{0,2}(?:VCC|VDD|VBAT|VBATT|VSYS|VBUS|VIN|VCORE|VPP|VEE|VMAIN|VREG|VOUT)[A-Z0-9]*$/;
// BAT, BATT, VBATTERY
const batteryWordPattern = /^V?BATT?(?:ERY)?$/;
// 3V3, 5V, 12V, 1V8, 0V9, 1V05, V1V8, 3V3A
const voltageWordPattern = /^[A-Z]?\d+V\d*[A-Z]?$/;

// Words that mark a signal about a rail rather than the rail: its enable, its power-good, its
// feedback or sense line, a divider feeding an ADC (VCC_3V3_EN, VBUS_DET, VBAT_SNS, VDD_PG).
const railSignalWords = new Set([
  'EN',
  'ENABLE',
  'PG',
  'PGOOD',
  'PWRGD',
  'GOOD',
  'OK',
  'FB',
  'FEEDBACK',
  'DIVIDER',
  'SENSE',
  'SNS',
  'SEN',
  'KELVIN',
  'DET',
  'DETECT',
  'ID',
  'CTRL',
  'CTL',
  'ON',
  'OFF',
  'ALERT',
  'INT',
  'IRQ',
  'STAT',
  'STATUS',
  'MON',
  'SCL',
  'SDA',
  'CLK',
  'RST',
  'RESET',
  'REQ',
  'ACK',
  'SEL',
  'PRES',
  'PRESENT',
  'ADC',
  'DIV',
  'TEMP',
  'NTC',
  'THERM',
]);

/**
 * Power rail by name (common practice): a word VCC…, VDD…, VBAT…, VSYS, VBUS (also USB_VBUS),
 * VIN…, VCORE, VPP, VEE, VMAIN, VREG, VOUT with up to two letters before it (AVDD, PVIN); BAT,
 * BATT, BATTERY; or a voltage word such as 3V3, 5V, 1V8, V1V8, +12V. Not a rail: ground names,
 * and names that also carry a signal word (VCC_3V3_EN, VBUS_DET, VBAT_SNS, BAT_ID).
 */
export function isPowerRailName(name: string): boolean {
  if (isGroundNetName(name)) return false;
  const words = nameWords(name);
  if (words.some((word) => railSignalWords.has(word))) return false;
  return words.some(
    (word) =>
      railWordPattern.test(word) ||
      batteryWordPattern.test(word) ||
      (voltageWordPattern.test(word) && word !== '0V'),
  );
}

/** Code-unit order, independent of locale, so the same board always comes out the same way. */
export function compareNetNames(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
