/** The cautions every design-guiding output carries (outputs.md `cautions`). */
export const CAUTIONS: readonly string[] = [
  'These are engineering estimates: confirm the design by test before relying on it.',
  'The convection coefficient h is usually the largest uncertainty: a 20-30 % error in h is common, and it moves the heat rate more than any shortcut drift shown here.',
  'Overheated electronics fail and hot surfaces burn: follow the applicable codes, standards and licensed engineering practice for temperature limits and guarding.',
  'The numerical reference solves the stated idealisation (steady conduction, the given h and k); the discretisation error quoted is the error of that model, not of the real part.',
];

/** The one-line form printed on every chart (charts travel alone into design notes). */
export const CHART_CAUTION = 'Estimates of an idealised fin: confirm by test; h is usually the largest uncertainty; follow applicable codes and practice.';

/** The same for a heat sink's charts (its idealisation: isoflux sources, the given h on each surface). */
export const SINK_CHART_CAUTION =
  'Estimates of an idealised sink (isoflux sources, the given h): confirm by test; h is usually the largest uncertainty; follow applicable codes and practice.';

/** How radiation is modelled, for notes and cautions. */
export const RADIATION_VIEW_NOTE = 'radiation: grey faces that see only the surroundings (view factor 1; no exchange with the base or other fins)';

/** The cautions of a fin: CAUTIONS, and for a radiating fin what its view factor leaves out. */
export function cautionsFor(emissivity: number): string[] {
  return emissivity > 0
    ? [
        ...CAUTIONS,
        `Radiation is modelled with ${RADIATION_VIEW_NOTE.replace('radiation: ', '')}; in an array, neighbouring fins see each other and radiate less.`,
      ]
    : [...CAUTIONS];
}
