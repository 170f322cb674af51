/**
 * The conventions the evaluation follows where published sources differ, as data so the UI
 * can show them beside the results. Each is tested (see the evaluation tests).
 */
export interface EvaluationConvention {
  key: string;
  statement: string;
}

export const EVALUATION_CONVENTIONS: readonly EvaluationConvention[] = [
  { key: 'cutoffs-inclusive', statement: 'Cutoffs are inclusive: a sample passes when Vsh <= Vsh max, porosity >= porosity min, Sw <= Sw max and, when set, permeability >= permeability min.' },
  { key: 'net-definitions', statement: 'Net reservoir passes the Vsh and porosity cutoffs (and the permeability cutoff when set); net pay is net reservoir that also passes the Sw cutoff. Porosity for cutoffs, averages and saturation is the effective porosity PHIE.' },
  { key: 'flag-missing', statement: 'A net flag is 0 as soon as one known value fails its cutoff, undetermined (null) when none fails but a needed value is missing, and 1 otherwise. Null samples are counted per zone with their thickness.' },
  { key: 'sample-thickness', statement: 'Each sample stands for the interval between the midpoints to its neighbouring samples (one depth step centred on it on a regular log; half-distances to the neighbours on an irregular one), clipped at zone boundaries, so the gross of a zone is its top-to-base thickness.' },
  { key: 'zone-ownership', statement: 'A sample is computed with the parameters of the zone containing its depth (top inclusive, base exclusive), or, when its depth lies in no zone but its interval reaches into one, with that zone; a sample straddling a zone edge counts in each zone only for the part inside it, judged with that zone\'s cutoffs. Samples in no zone are left empty.' },
  { key: 'averaging', statement: 'Porosity and Vsh are averaged by thickness; Sw is averaged by pore volume (porosity x thickness). Averages use measured-depth thickness. Phi-h = sum(porosity x h); hydrocarbon pore thickness = sum(porosity x (1 - Sw) x h).' },
  { key: 'gr-index-clipped', statement: 'The gamma-ray index is clipped to [0, 1] before the linear, Larionov, Steiber or Clavier transform; clipped samples are counted.' },
  { key: 'porosity-clamp', statement: 'Total porosity is clamped to [0, phi max] (default 0.5) and effective porosity to [0, total porosity]; clamped samples are counted per zone.' },
  { key: 'sw-clamp', statement: 'Water saturation is clamped to [0, 1]; clamped samples are counted per zone.' },
  { key: 'effective-porosity', statement: 'Effective porosity = total porosity - Vsh x shale porosity (the apparent porosity of 100% shale on the chosen porosity method).' },
  { key: 'neutron-density', statement: 'Neutron-density porosity is the arithmetic mean of neutron and density porosity; the gas form is the root mean square sqrt((phiN^2 + phiD^2)/2) (Gaymard & Poupon 1968). The neutron curve is expected on the matrix of the zone.' },
  { key: 'sonic', statement: 'Sonic porosity: Wyllie time average (with compaction factor) or the exact root of the Raymer-Hunt-Gardner velocity relation 1/dt = (1 - phi)^2/dt matrix + phi/dt fluid.' },
  { key: 'simandoux-form', statement: 'Simandoux is used in the form 1/Rt = phi^m Sw^n/(a Rw) + Vsh Sw/Rsh (no (1 - Vsh) factor); n = 2 is solved as a quadratic, other n by Newton iteration. Indonesia is Poupon & Leveaux (1971).' },
  { key: 'arps', statement: "Rw is corrected to formation temperature by Arps: Rw2 = Rw1 (T1 + 6.77)/(T2 + 6.77) in Fahrenheit, (T1 + 21.5)/(T2 + 21.5) in Celsius, in the zone's temperature unit." },
  { key: 'temperature', statement: 'Formation temperature is linear in true vertical depth below the log depth datum (TVD from the survey when given, otherwise measured depth): surface temperature + gradient x depth, the gradient given per 100 depth units or from a bottom-hole temperature at its depth. Rankine = F + 459.67; Kelvin = C + 273.15.' },
  { key: 'ssp', statement: 'Rw from SP: SSP = -K log10(Rmfe/Rwe), K = 61 + 0.133 T(F), Rmfe = 0.85 Rmf at formation temperature, Rw = Rwe (no chart correction; valid for Rwe above about 0.1 ohm.m).' },
  { key: 'pickett', statement: 'Pickett fit: least-squares line of log10(Rt) on log10(PHIE) over a water-bearing interval of the zone; m = -slope, a Rw = 10^intercept at the interval\'s mid-depth temperature.' },
  { key: 'survey', statement: 'TVD from a deviation survey by minimum curvature (positions between stations on the same arc); above the first and below the last station the hole continues straight. A TVD table is interpolated linearly. TVT uses the zone\'s formation dip and dip azimuth (TVT = TVD thickness when the dip is zero).' },
];
