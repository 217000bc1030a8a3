// What a bench supply does when it feeds a shorted rail: the textbook constant-voltage /
// constant-current supply. Set to V volts with a current limit of I amps, it holds V across any load
// of more than V ÷ I ohms (the crossover resistance) and drives exactly I into anything less, the
// voltage then falling to I·R. The power that ends up in the short is P = V_load · I_load.

export type SupplyMode = 'constant_voltage' | 'constant_current' | 'crossover';

export interface SupplySetting {
  /** the voltage the supply is set to, volts */
  volts: number;
  /** the current limit, amps */
  amps: number;
}

export interface ShortLoad {
  /** which of the supply's two limits holds: the voltage, the current, or both at once */
  mode: SupplyMode;
  /** current through the short, amps */
  amps: number;
  /** voltage across the short, volts */
  volts: number;
  /** power turned to heat in the short, watts */
  watts: number;
  /** load resistance at which the supply changes over from one limit to the other, ohms */
  crossoverOhms: number;
}

/** Which setting or reading was out of range, and why: for a message beside that field. */
export class InjectionInputError extends RangeError {
  constructor(
    readonly field: 'volts' | 'amps' | 'ohms',
    message: string,
  ) {
    super(message);
    this.name = 'InjectionInputError';
  }
}

function checkSetting({ volts, amps }: SupplySetting) {
  if (!Number.isFinite(volts) || volts <= 0) {
    throw new InjectionInputError(
      'volts',
      `the supply voltage must be a number above 0 V, not ${volts}`,
    );
  }
  if (!Number.isFinite(amps) || amps <= 0) {
    throw new InjectionInputError(
      'amps',
      `the current limit must be a number above 0 A, not ${amps}`,
    );
  }
}

// Loads within this share of the crossover resistance count as sitting on it: the two limits
// then agree to far better than any bench supply holds them.
const crossoverTolerance = 1e-9;

/** The supply's answer to a short of `ohms` to ground. */
export function supplyIntoShort(setting: SupplySetting, ohms: number): ShortLoad {
  checkSetting(setting);
  if (!Number.isFinite(ohms) || ohms < 0) {
    throw new InjectionInputError(
      'ohms',
      `the resistance to ground must be a number of 0 Ω or more, not ${ohms}`,
    );
  }
  const crossoverOhms = setting.volts / setting.amps;
  if (Math.abs(ohms - crossoverOhms) <= crossoverTolerance * crossoverOhms) {
    return {
      mode: 'crossover',
      amps: setting.amps,
      volts: setting.volts,
      watts: setting.volts * setting.amps,
      crossoverOhms,
    };
  }
  if (ohms < crossoverOhms) {
    const volts = setting.amps * ohms;
    return {
      mode: 'constant_current',
      amps: setting.amps,
      volts,
      watts: volts * setting.amps,
      crossoverOhms,
    };
  }
  const amps = setting.volts / ohms;
  return {
    mode: 'constant_voltage',
    amps,
    volts: setting.volts,
    watts: setting.volts * amps,
    crossoverOhms,
  };
}

/**
 * The most any short can take from this setting, reached when its resistance equals the crossover
 * resistance: below it the voltage across the short falls, above it the current does. For when the
 * short's resistance has not been measured.
 */
export function mostPowerIntoShort(setting: SupplySetting): { watts: number; atOhms: number } {
  checkSetting(setting);
  return { watts: setting.volts * setting.amps, atOhms: setting.volts / setting.amps };
}

export type InjectionConcern = 'above_rail_voltage' | 'rail_voltage_unknown' | 'negative_rail';

/**
 * What to say before the supply is switched on. Common practice: never inject more than the rail's
 * own nominal voltage, since everything on the rail is rated for that and not more; a rail of unknown
 * voltage gives no ceiling; a negative rail is fed with the supply's polarity reversed, and its
 * ceiling is the size of its voltage.
 */
export function injectionConcerns(
  setting: SupplySetting,
  railVolts: number | null,
): InjectionConcern[] {
  checkSetting(setting);
  if (railVolts === null || !Number.isFinite(railVolts) || railVolts === 0)
    return ['rail_voltage_unknown'];
  const concerns: InjectionConcern[] = [];
  if (railVolts < 0) concerns.push('negative_rail');
  if (setting.volts > Math.abs(railVolts)) concerns.push('above_rail_voltage');
  return concerns;
}
