/**
 * Built-in materials: thermal conductivity k near room temperature, W/(m*K), and where the value comes from.
 *
 * `source` is what every output shows beside k (check and solve headers, reports, `fincheck materials`): the
 * published table and its temperature where the value is a table's, else, for alloys, polymers and ceramics whose
 * grades and tempers vary, "typical ...; confirm with the supplier's data sheet". `provenance` is for developers
 * only (never printed): "compared with the table" means the number was compared with a copy of the cited table;
 * "from memory" means it was recalled and should be confirmed before it is relied on. A case that needs a better
 * number gives `material: { k: ... }`.
 *
 * The Incropera tables: Incropera, DeWitt, Bergman & Lavine (2007), Fundamentals of Heat and Mass Transfer,
 * 6th ed., Wiley, Appendix A, Table A.1 (metallic solids) and Table A.2 (nonmetallic solids), at 300 K.
 */
import { nearWords } from './spelling.js';
import type { Material } from './types.js';

export interface BuiltInMaterial {
  name: string;
  /** What the name means (alloy, temper, grade). */
  description: string;
  /** Thermal conductivity near room temperature, W/(m*K). */
  k: number;
  /** Shown to the user: the table and temperature, or "typical ...; confirm with the supplier's data sheet". */
  source: string;
  /** Not shown: whether the value was compared with the cited table or recalled (and from where). */
  provenance: string;
}

const incroperaA1 = 'Incropera, DeWitt, Bergman & Lavine 2007, Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1, 300 K';
const incroperaA2 = 'Incropera, DeWitt, Bergman & Lavine 2007, Fundamentals of Heat and Mass Transfer, 6th ed., Table A.2, 300 K';
const compared = 'compared with the table';
/** For grades that vary: the value is typical, not a guaranteed property. */
const typical = (what: string) => `typical of ${what} near 25 degC; confirm with the supplier's data sheet`;

export const builtInMaterials: readonly BuiltInMaterial[] = [
  { name: 'aluminium-pure', description: 'pure aluminium', k: 237, source: incroperaA1, provenance: compared },
  {
    name: 'aluminium-1100',
    description: 'commercially pure aluminium 1100 (O temper)',
    k: 222,
    source: typical('aluminium 1100-O'),
    provenance: 'ASM Handbook Vol. 2 (1990), wrought aluminium 1100-O at 25 degC (from memory)',
  },
  {
    name: 'aluminium-2024',
    description: 'aluminium alloy 2024-T6 (4.5% Cu, 1.5% Mg, 0.6% Mn)',
    k: 177,
    source: incroperaA1,
    provenance: compared,
  },
  {
    name: 'aluminium-6061',
    description: 'aluminium alloy 6061-T6',
    k: 167,
    source: typical('aluminium 6061-T6'),
    provenance: 'ASM Handbook Vol. 2 (1990), 6061-T6 at 25 degC (from memory)',
  },
  {
    name: 'aluminium-6063',
    description: 'aluminium alloy 6063-T5, the usual extruded heat-sink alloy',
    k: 209,
    source: typical('aluminium 6063-T5 (6063-T6 is about 200)'),
    provenance: 'ASM Handbook Vol. 2 (1990), 6063-T5 at 25 degC (from memory)',
  },
  { name: 'copper-pure', description: 'pure copper', k: 401, source: incroperaA1, provenance: compared },
  // `copper` is the plain name the heat-sink format's example uses (heat-sink.md: `plate.material: copper`): pure copper.
  { name: 'copper', description: 'pure copper (the same value as copper-pure)', k: 401, source: incroperaA1, provenance: compared },
  {
    name: 'copper-c110',
    description: 'copper C11000, electrolytic tough pitch',
    k: 388,
    source: typical('copper C11000'),
    provenance: 'ASM Handbook Vol. 2 (1990), C11000 at 20 degC (from memory)',
  },
  {
    name: 'brass',
    description: 'cartridge brass, 70% Cu 30% Zn (C26000)',
    k: 110,
    source: incroperaA1,
    provenance: compared,
  },
  { name: 'silver-pure', description: 'pure silver', k: 429, source: incroperaA1, provenance: compared },
  {
    name: 'carbon-steel-1010',
    description: 'plain carbon steel AISI 1010',
    k: 63.9,
    source: `${incroperaA1} (AISI 1010 row)`,
    provenance: 'Incropera Table A.1, AISI 1010 row (from memory: the row was not compared with a copy)',
  },
  {
    name: 'stainless-304',
    description: 'stainless steel AISI 304',
    k: 14.9,
    source: `${incroperaA1} (AISI 304 row)`,
    provenance: 'Incropera Table A.1, AISI 304 row (from memory: the row was not compared with a copy)',
  },
  { name: 'stainless-316', description: 'stainless steel AISI 316', k: 13.4, source: incroperaA1, provenance: compared },
  { name: 'titanium-pure', description: 'pure titanium', k: 21.9, source: incroperaA1, provenance: compared },
  {
    name: 'titanium-6al4v',
    description: 'titanium alloy Ti-6Al-4V (annealed)',
    k: 6.7,
    source: typical('annealed Ti-6Al-4V'),
    provenance: 'ASM Handbook Vol. 2 (1990), titanium alloys, Ti-6Al-4V at room temperature (from memory)',
  },
  { name: 'magnesium-pure', description: 'pure magnesium', k: 156, source: incroperaA1, provenance: compared },
  {
    name: 'magnesium-az31',
    description: 'magnesium alloy AZ31B',
    k: 96,
    source: typical('magnesium AZ31B'),
    provenance: 'ASM Handbook Vol. 2 (1990), AZ31B at 20 degC (from memory)',
  },
  { name: 'silicon', description: 'pure silicon', k: 148, source: incroperaA1, provenance: compared },
  {
    name: 'polymer-pa66',
    description: 'polyamide 6.6 (nylon), unfilled',
    k: 0.25,
    source: `EN ISO 10077-2:2003, Thermal performance of windows, doors and shutters, Part 2, Annex D (polyamide); ${typical('unfilled PA66')}`,
    provenance: 'EN ISO 10077-2:2003 Annex D table, polyamide (nylon) 0.25: compared with a copy; table number from memory',
  },
  {
    name: 'polymer-pa66-gf25',
    description: 'polyamide 6.6 with 25% glass fibre',
    k: 0.3,
    source: `EN ISO 10077-2:2003, Annex D (polyamide 6.6 with 25% glass fibre); ${typical('PA66-GF25')}`,
    provenance: 'EN ISO 10077-2:2003 Annex D table, PA66 GF25 0.30: compared with a copy; table number from memory',
  },
  {
    name: 'polymer-pps-tc',
    description: 'thermally conductive PPS compound (filled polyphenylene sulfide), in-plane; through-plane is several times lower',
    k: 10,
    source: typical('thermally conductive PPS compounds, in-plane'),
    provenance: 'Celanese (formerly Cool Polymers) CoolPoly D5108 datasheet, in-plane (from memory)',
  },
  {
    name: 'polymer-abs',
    description: 'ABS (acrylonitrile butadiene styrene), unfilled',
    k: 0.17,
    source: typical('unfilled ABS (data sheets give 0.14-0.21)'),
    provenance: 'manufacturers\u2019 ABS datasheets, 0.14-0.21 (from memory, no single source checked)',
  },
  {
    name: 'ceramic-alumina',
    description: 'aluminium oxide, polycrystalline (dense)',
    k: 36.0,
    source: incroperaA2,
    provenance: compared,
  },
  {
    name: 'aluminium-nitride',
    description: 'sintered aluminium nitride, substrate grade',
    k: 170,
    source: typical('sintered AlN substrates (about 140-230 by grade)'),
    provenance:
      'manufacturers\u2019 datasheets for sintered AlN, 140-230 by grade (from memory); the intrinsic single-crystal ' +
      'value is about 285: Slack, Tanzilli, Pohl & Vandersande 1987, J. Phys. Chem. Solids 48(7):641-647 (from memory)',
  },
  {
    name: 'beryllium-oxide',
    description: 'beryllium oxide (beryllia), dense',
    k: 272,
    source: incroperaA2,
    provenance: compared,
  },
];

const byName = new Map(builtInMaterials.map((m) => [m.name, m]));

/** The built-in material called `name` (exact, case-insensitive), as the normalised Material, or undefined. */
export function findMaterial(name: string): Material | undefined {
  const m = byName.get(name.trim().toLowerCase());
  return m ? { name: m.name, k: { kind: 'constant', k: m.k }, source: m.source } : undefined;
}

export const materialNames: readonly string[] = builtInMaterials.map((m) => m.name);

/** Built-in names within a few typing slips of `name`, for "did you mean" in messages. */
export function similarMaterialNames(name: string, maxDistance = 3): string[] {
  return nearWords(name.trim(), materialNames, maxDistance);
}
