/**
 * Display units: the units numbers are shown in (text, charts, maps, reports). JSON output stays SI with
 * unit-suffixed keys; only what a person reads changes.
 *
 * shown = value_SI * scale + offset, with value_SI in m, degC (absolute temperatures), K (differences), W,
 * W/(m^2*K), W/(m*K), W/m^2, K/W, W/m.
 *
 * Factors from the exact definitions (NIST SP 811, 2008, Guide for the Use of the International System of Units,
 * Appendix B.8 and B.9): in = 0.0254 m, ft = 0.3048 m (exact); Btu_IT = 1055.05585262 J (exact); h = 3600 s;
 * a degF difference = 5/9 K; T[degF] = 1.8 T[degC] + 32, T[K] = T[degC] + 273.15, T[degR] = 1.8 T[K].
 * Derived: 1 Btu_IT/h = 0.2930711 W; 1 Btu_IT/(h*ft^2*degF) = 5.678263 W/(m^2*K); 1 Btu_IT/(h*ft*degF) =
 * 1.730735 W/(m*K); 1 Btu_IT/(h*ft^2) = 3.154591 W/m^2; 1 degF*h/Btu_IT = 1.895634 K/W; 1 Btu_IT/(h*ft) =
 * 0.9615171 W/m (NIST SP 811 Appendix B.8 lists the first five to 7 digits; recalled from memory, not checked against
 * the document; tests/case/display-units.test.ts checks the factors against them).
 */

export const displayKinds = ['length', 'temperature', 'heat', 'h', 'k', 'flux', 'resistance'] as const;
/** The kinds a case's `display` key may set. */
export type DisplayKind = (typeof displayKinds)[number];

export interface DisplayUnit {
  /** As written in a case's `display` key and in plain text: `degF`, `W/(m^2*K)`. */
  ascii: string;
  /** As charts and reports print it: `°F`, `W/(m²·K)`. */
  pretty: string;
  /** shown = SI * scale + offset. */
  scale: number;
  offset: number;
}

/** The units every shown quantity uses; built by displaySystem or resolveDisplayUnits, passed as data to formatters. */
export interface DisplayUnits {
  /** The preset it came from, or `custom` when a case's `display` key changed a unit. */
  system: DisplaySystem | 'custom';
  length: DisplayUnit;
  /** Absolute temperatures. */
  temperature: DisplayUnit;
  /** Temperature differences (rises, margins): K for degC and K, degF for degF, degR for degR. */
  temperatureDifference: DisplayUnit;
  heat: DisplayUnit;
  h: DisplayUnit;
  k: DisplayUnit;
  flux: DisplayUnit;
  resistance: DisplayUnit;
  /** Heat per unit length (q' along a fin): heat over the preset's length of reference (W/m, Btu/(h*ft)). */
  heatPerLength: DisplayUnit;
}

const inch = 0.0254;
const foot = 0.3048;
const btu = 1055.05585262;
const hour = 3600;
const degF = 5 / 9;

const unit = (ascii: string, pretty: string, scale: number, offset = 0): DisplayUnit => ({ ascii, pretty, scale, offset });

/** Accepted units of each kind (the `display` key and its messages list these names). */
export const displayUnitChoices: Record<DisplayKind, Record<string, DisplayUnit>> = {
  length: {
    m: unit('m', 'm', 1),
    cm: unit('cm', 'cm', 100),
    mm: unit('mm', 'mm', 1000),
    um: unit('um', 'µm', 1e6),
    in: unit('in', 'in', 1 / inch),
    ft: unit('ft', 'ft', 1 / foot),
  },
  temperature: {
    degC: unit('degC', '°C', 1),
    K: unit('K', 'K', 1, 273.15),
    degF: unit('degF', '°F', 1 / degF, 32),
    degR: unit('degR', '°R', 1 / degF, 273.15 / degF),
  },
  heat: {
    W: unit('W', 'W', 1),
    kW: unit('kW', 'kW', 1e-3),
    'BTU/h': unit('BTU/h', 'BTU/h', hour / btu),
  },
  h: {
    'W/(m^2*K)': unit('W/(m^2*K)', 'W/(m²·K)', 1),
    'BTU/(h*ft^2*degF)': unit('BTU/(h*ft^2*degF)', 'BTU/(h·ft²·°F)', (hour * foot * foot * degF) / btu),
  },
  k: {
    'W/(m*K)': unit('W/(m*K)', 'W/(m·K)', 1),
    'BTU/(h*ft*degF)': unit('BTU/(h*ft*degF)', 'BTU/(h·ft·°F)', (hour * foot * degF) / btu),
  },
  flux: {
    'W/m^2': unit('W/m^2', 'W/m²', 1),
    'BTU/(h*ft^2)': unit('BTU/(h*ft^2)', 'BTU/(h·ft²)', (hour * foot * foot) / btu),
  },
  resistance: {
    'K/W': unit('K/W', 'K/W', 1),
    'degF*h/BTU': unit('degF*h/BTU', '°F·h/BTU', btu / (hour * degF)),
  },
};

export const displaySystems = ['si', 'mm', 'us'] as const;
/** `si`: lengths in m; `mm`: lengths in mm, the rest SI (what fincheck shows by default); `us`: in, degF, BTU/h. */
export type DisplaySystem = (typeof displaySystems)[number];

const presets: Record<DisplaySystem, Record<DisplayKind, string>> = {
  si: { length: 'm', temperature: 'degC', heat: 'W', h: 'W/(m^2*K)', k: 'W/(m*K)', flux: 'W/m^2', resistance: 'K/W' },
  mm: { length: 'mm', temperature: 'degC', heat: 'W', h: 'W/(m^2*K)', k: 'W/(m*K)', flux: 'W/m^2', resistance: 'K/W' },
  us: { length: 'in', temperature: 'degF', heat: 'BTU/h', h: 'BTU/(h*ft^2*degF)', k: 'BTU/(h*ft*degF)', flux: 'BTU/(h*ft^2)', resistance: 'degF*h/BTU' },
};

export function isDisplaySystem(value: unknown): value is DisplaySystem {
  return typeof value === 'string' && (displaySystems as readonly string[]).includes(value);
}

function differenceOf(temperature: DisplayUnit): DisplayUnit {
  if (temperature.ascii === 'degF') return unit('degF', '°F', 1 / degF);
  if (temperature.ascii === 'degR') return unit('degR', '°R', 1 / degF);
  return unit('K', 'K', 1);
}

function build(system: DisplaySystem | 'custom', names: Record<DisplayKind, string>): DisplayUnits {
  const pick = (kind: DisplayKind): DisplayUnit => {
    const found = displayUnitChoices[kind][names[kind]];
    if (found === undefined) throw new Error(`display unit ${names[kind]} is not a ${kind} unit`);
    return found;
  };
  const heat = pick('heat');
  const us = heat.ascii === 'BTU/h';
  const heatPerLength = us
    ? unit('BTU/(h*ft)', 'BTU/(h·ft)', heat.scale * foot)
    : heat.ascii === 'kW'
      ? unit('kW/m', 'kW/m', 1e-3)
      : unit('W/m', 'W/m', 1);
  const temperature = pick('temperature');
  return {
    system,
    length: pick('length'),
    temperature,
    temperatureDifference: differenceOf(temperature),
    heat,
    h: pick('h'),
    k: pick('k'),
    flux: pick('flux'),
    resistance: pick('resistance'),
    heatPerLength,
  };
}

/** The units of a preset. */
export function displaySystem(system: DisplaySystem): DisplayUnits {
  return build(system, presets[system]);
}

/** What fincheck shows when nothing is chosen: lengths in mm, the rest SI (degC, W). */
export const defaultDisplayUnits: DisplayUnits = displaySystem('mm');

/**
 * The units of a case: its `display` key's units over the preset its inputs suggest (`us` when they are written
 * mostly in US units, else `mm`).
 */
export function resolveDisplayUnits(given: Partial<Record<DisplayKind, string>> | undefined, detected: DisplaySystem): DisplayUnits {
  if (given === undefined || Object.keys(given).length === 0) return displaySystem(detected);
  const names = { ...presets[detected] };
  for (const kind of displayKinds) {
    const name = given[kind];
    if (name !== undefined) names[kind] = name;
  }
  return build('custom', names);
}

/** A value in SI shown in `u`. */
export function inUnit(u: DisplayUnit, si: number): number {
  return si * u.scale + u.offset;
}

/** An array of SI values shown in `u`. */
export function arrayInUnit(u: DisplayUnit, si: ArrayLike<number>): Float64Array {
  const out = new Float64Array(si.length);
  for (let i = 0; i < si.length; i++) out[i] = (si[i] as number) * u.scale + u.offset;
  return out;
}

/** Unit tokens that mark a value as written in US customary units. */
const usTokens = /(^|[^A-Za-z])(in|inch|inches|ft|foot|feet|mil|degF|fahrenheit|degR|rankine|BTU|Btu|btu|lbf|lbm|lb|hp)([^A-Za-z]|$)/;
/** Unit tokens that mark a value as written in metric units (µm, μm, °C, ℃ as \u escapes: the bundle stays ASCII, units.ts). */
const metricTokens = /(^|[^A-Za-z])(m|cm|mm|um|\u00b5m|\u03bcm|km|degC|celsius|\u00b0C|\u2103|K|kelvin|W|kW|mW|J)([^A-Za-z]|$)/;

/**
 * The preset a raw case's inputs suggest: `us` when more of its values carry US units (in, ft, degF, BTU, ...; or
 * `units: { length: in }`) than metric ones, else `mm`.
 */
export function detectDisplaySystem(raw: unknown): DisplaySystem {
  let us = 0;
  let metric = 0;
  const visit = (value: unknown, key: string | undefined): void => {
    if (typeof value === 'string') {
      if (key === 'name' || key === 'extends' || !/^\s*[+-]?[\d.]/.test(value)) return;
      if (usTokens.test(value)) us++;
      else if (metricTokens.test(value)) metric++;
    } else if (Array.isArray(value)) value.forEach((v) => visit(v, key));
    else if (typeof value === 'object' && value !== null) {
      for (const [k, v] of Object.entries(value)) {
        if (k === 'display') continue;
        if (k === 'units' && typeof v === 'object' && v !== null && (v as Record<string, unknown>).length === 'in') us++;
        else visit(v, k);
      }
    }
  };
  visit(raw, undefined);
  return us > metric ? 'us' : 'mm';
}
