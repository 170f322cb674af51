import { Callout, Flex, Heading, Text } from '@radix-ui/themes';
import { useState } from 'react';
import type { SurveyDto } from '../../../types/workbench';

export interface SurveyUploadProps {
  survey: SurveyDto | null | undefined;
  canEdit: boolean;
  uploading: boolean;
  error: string | null;
  onFile: (file: File, depthUnit?: 'ft' | 'm') => void;
}

function stationCount(s: SurveyDto): number {
  return s.stations.length;
}

/** Deviation survey of the well: a CSV with header md,inclination,azimuth; TVD by minimum curvature. */
export function SurveyUpload({ survey, canEdit, uploading, error, onFile }: SurveyUploadProps) {
  const [unit, setUnit] = useState<'' | 'ft' | 'm'>('');
  const last = survey?.tvdAtStations?.length ? survey.tvdAtStations[survey.tvdAtStations.length - 1] : null;
  return (
    <section aria-labelledby="survey-heading">
      <Heading as="h3" size="3" id="survey-heading" mb="2">
        Deviation survey
      </Heading>
      <Flex direction="column" gap="2">
        {survey ? (
          <Text size="2" role="status">
            {stationCount(survey)} stations stored; TVD at the last station {last === null ? '–' : `${Number(last.toFixed(2))} ${survey.depthUnit}`}. Thickness is
            reported in MD, TVD and TVT.
          </Text>
        ) : (
          <Text size="2" color="gray">
            No survey: the well is treated as vertical (TVD = MD).
          </Text>
        )}
        {canEdit ? (
          <Flex gap="2" align="center">
            <label htmlFor="survey-unit" className="zp-inline-label">
              Unit of md
            </label>
            <select id="survey-unit" className="native-select" value={unit} onChange={(e) => setUnit(e.currentTarget.value as '' | 'ft' | 'm')}>
              <option value="">from the header, else the logs’ unit</option>
              <option value="ft">ft</option>
              <option value="m">m</option>
            </select>
          </Flex>
        ) : null}
        {canEdit ? (
          <label className="file-pick">
            <span>{survey ? 'Replace the survey (CSV)' : 'Upload a survey (CSV)'}</span>
            <input
              type="file"
              accept=".csv,text/csv"
              aria-label="Deviation survey CSV"
              disabled={uploading}
              onChange={(e) => {
                const file = e.currentTarget.files?.[0];
                if (file) onFile(file, unit || undefined);
                e.currentTarget.value = '';
              }}
            />
            <Text size="1" color="gray">
              header: md, inclination (or inc), azimuth (or azi), in degrees; md may name its unit, e.g. “md (m)”
            </Text>
          </label>
        ) : null}
        {uploading ? (
          <Text size="2" role="status">
            Uploading…
          </Text>
        ) : null}
        {error ? (
          <Callout.Root color="tomato" role="alert">
            <Callout.Text>{error}</Callout.Text>
          </Callout.Root>
        ) : null}
      </Flex>
    </section>
  );
}
