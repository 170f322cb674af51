import { writeLas, type EvaluateWellResult, type LasWriteCurve } from '@poreline/core';
import type { MergedSamples } from '../workbench/merged-samples.service.js';
import type { Provenance } from './table-files.js';

const COMPUTED: { key: keyof EvaluateWellResult['curves']; unit: string; description: string }[] = [
  { key: 'VSH', unit: 'V/V', description: 'Shale volume' },
  { key: 'PHIT', unit: 'V/V', description: 'Total porosity' },
  { key: 'PHIE', unit: 'V/V', description: 'Effective porosity' },
  { key: 'SW', unit: 'V/V', description: 'Water saturation' },
  { key: 'BVW', unit: 'V/V', description: 'Bulk volume water' },
  { key: 'PERM', unit: 'MD', description: 'Permeability' },
  { key: 'NET_RES', unit: '', description: 'Net reservoir flag (1 pass, 0 fail)' },
  { key: 'NET_PAY', unit: '', description: 'Net pay flag (1 pass, 0 fail)' },
];

/** LAS header values end at the last colon: keep colons out of free text. */
const noColon = (text: string) => text.replace(/:/g, ' ');

/** LAS units of the canonical units the merge produces (upper case, no spaces). */
const LAS_UNIT: Record<string, string> = { gAPI: 'GAPI', 'g/cm3': 'G/CM3', 'v/v': 'V/V', 'us/ft': 'US/FT', 'ohm.m': 'OHMM', mV: 'MV', in: 'IN', 'b/e': 'B/E' };

/**
 * LAS 2.0 of an interpretation: the merged index, the bound input curves (canonical units),
 * then the computed curves (VSH, PHIT, PHIE, SW, BVW, PERM when computed, NET_RES, NET_PAY),
 * with the provenance in ~Other. Written by core's writeLas.
 */
export function interpretationLas(well: { name: string; uwi: string; field: string }, merged: MergedSamples, result: EvaluateWellResult, provenance: Provenance): string {
  const curves: LasWriteCurve[] = [
    { mnemonic: 'DEPT', unit: merged.depthUnit.toUpperCase(), description: 'Measured depth', values: merged.depth },
    ...merged.entries.map((e, i) => ({
      mnemonic: e.mnemonic,
      unit: LAS_UNIT[e.unit] ?? e.unit.replace(/\s+/g, ''),
      description: noColon(`${e.source.mnemonic} of ${e.source.fileName}`),
      values: merged.values[i],
    })),
    ...COMPUTED.flatMap((c) => {
      const values = result.curves[c.key];
      return values ? [{ mnemonic: c.key, unit: c.unit, description: `${c.description} (Poreline)`, values }] : [];
    }),
  ];
  return writeLas({
    well: [
      { mnemonic: 'WELL', value: noColon(well.name), description: 'Well name' },
      { mnemonic: 'UWI', value: noColon(well.uwi), description: 'Unique well identifier' },
      { mnemonic: 'FLD', value: noColon(well.field), description: 'Field (asset)' },
    ],
    curves,
    other: provenance.map(([k, v]) => `${k} = ${v}`.replace(/[\r\n]+/g, ' ')).join('\n'),
  });
}
