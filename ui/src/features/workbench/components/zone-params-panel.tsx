import { defaultZoneParameters } from '@poreline/core';
import { Callout, Flex, Text } from '@radix-ui/themes';
import { useState } from 'react';
import type { FormationDto, WorkbenchZone } from '../../../types/workbench';
import { usePutZoneParameters, useZoneParameters } from '../api/zone-parameters';
import type { ZoneParametersJson } from '../utils/zone-params-form';
import { ZoneParamsForm } from './zone-params-form';

export interface ZoneParamsPanelProps {
  assetId: string;
  wellId: string;
  depthUnit: string;
  zones: readonly WorkbenchZone[];
  formations: readonly FormationDto[];
  canEdit: boolean;
}

/** Picks a zone of the well and edits its evaluation parameters. */
export function ZoneParamsPanel({ assetId, wellId, depthUnit, zones, formations, canEdit }: ZoneParamsPanelProps) {
  const [chosen, setChosen] = useState<string | null>(null);
  const zone = zones.find((z) => z.formationId === chosen) ?? zones[0];
  if (!zone) return <Text color="gray">No zones yet: add formation tops first.</Text>;
  const lithology = formations.find((f) => f.id === zone.formationId)?.lithology;
  return (
    <Flex direction="column" gap="3">
      <Flex gap="2" align="center">
        <label htmlFor="params-zone" className="zp-inline-label">
          Zone
        </label>
        <select id="params-zone" className="native-select" value={zone.formationId} onChange={(e) => setChosen(e.currentTarget.value)}>
          {zones.map((z) => (
            <option key={z.formationId} value={z.formationId}>
              {z.name}
            </option>
          ))}
        </select>
        {lithology ? (
          <Text size="1" color="gray">
            formation lithology: {lithology.replace('_', ' ')}
          </Text>
        ) : null}
      </Flex>
      <ZoneParams key={zone.formationId} assetId={assetId} wellId={wellId} zone={zone} depthUnit={depthUnit} canEdit={canEdit} lithology={lithology} />
    </Flex>
  );
}

interface ZoneParamsProps {
  assetId: string;
  wellId: string;
  zone: WorkbenchZone;
  depthUnit: string;
  canEdit: boolean;
  lithology?: string;
}

function ZoneParams({ assetId, wellId, zone, depthUnit, canEdit, lithology }: ZoneParamsProps) {
  const stored = useZoneParameters(assetId, wellId, zone.formationId);
  const put = usePutZoneParameters(assetId, wellId, zone.formationId);
  if (stored.isPending) return <Text color="gray">Loading parameters…</Text>;
  if (stored.isError) {
    return (
      <Callout.Root color="tomato" role="alert">
        <Callout.Text>{stored.error.message}</Callout.Text>
      </Callout.Root>
    );
  }
  const unit = depthUnit === 'm' ? 'm' : 'ft';
  return (
    <ZoneParamsForm
      zoneName={zone.name}
      depthUnit={depthUnit}
      params={stored.data.params as unknown as ZoneParametersJson}
      isDefault={stored.data.isDefault}
      canEdit={canEdit}
      lithology={lithology}
      defaultsFor={(lith) => defaultZoneParameters(lith, unit) as unknown as ZoneParametersJson}
      onSave={(params) => put.mutateAsync(params as unknown as Record<string, unknown>)}
    />
  );
}
