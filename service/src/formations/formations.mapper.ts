import type { Formation } from '@poreline/schema';
import type { FormationDto } from './dto/formation.dto.js';
import type { FormationLithology } from './lithologies.js';

export function toFormationDto(f: Formation): FormationDto {
  return {
    id: f.id,
    name: f.name,
    ordinal: f.ordinal,
    colour: f.colour,
    lithology: f.lithology as FormationLithology,
    cutoffs: { vshMax: f.vshMax, phiMin: f.phiMin, swMax: f.swMax, permMin: f.permMin },
  };
}

/** The audited view of a formation (what a reader of the audit log needs to see changed). */
export function formationAuditView(f: Formation) {
  return { name: f.name, ordinal: f.ordinal, colour: f.colour, lithology: f.lithology };
}
