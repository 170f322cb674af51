import { Callout, DataList, Flex, Heading, Tabs, Text } from '@radix-ui/themes';
import { useState, type ReactNode } from 'react';
import { formatDateTime } from '../../../lib/format';
import type { ReservesCase } from '../../../types/reserves';
import { CaseInputsForm } from './case-inputs-form';
import { ResultsPanel } from './results-panel';
import { ReservesCaution } from './reserves-caution';
import { ReviewActions } from './review-actions';
import { SourcesPanel } from './sources-panel';
import { CaseStatusBadge } from './status-badge';

export interface CaseEditorProps {
  assetId: string;
  reservesCase: ReservesCase;
  /** Engineer or admin of the asset. */
  canEdit: boolean;
  /** Reviewer or admin of the asset. */
  canReview: boolean;
  /** The production cross-checks panel (composed by the page). */
  crossChecks?: ReactNode;
  /** The inflow calculator (composed by the page). */
  inflow?: ReactNode;
}

type Tab = 'inputs' | 'results' | 'cross-checks' | 'inflow';

/** One reserves case: header and review, sources and inputs, results, cross-checks and inflow. */
export function CaseEditor({ assetId, reservesCase: c, canEdit, canReview, crossChecks, inflow }: CaseEditorProps) {
  const [tab, setTab] = useState<Tab>(c.results ? 'results' : 'inputs');
  const editable = canEdit && (c.status === 'draft' || c.status === 'returned');
  return (
    <Flex direction="column" gap="4">
      <Flex direction="column" gap="2">
        <Flex align="center" gap="3" wrap="wrap">
          <Heading as="h1" size="6">
            {c.name}
          </Heading>
          <CaseStatusBadge status={c.status} />
        </Flex>
        <DataList.Root orientation="horizontal" size="1" className="rc-meta">
          <DataList.Item>
            <DataList.Label>Target formation</DataList.Label>
            <DataList.Value>{c.formationName}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Revision</DataList.Label>
            <DataList.Value>{c.revision}</DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Standard conditions</DataList.Label>
            <DataList.Value>
              {c.inputs.standard.pressurePsia} psia, {c.inputs.standard.temperatureF} F
            </DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Created by</DataList.Label>
            <DataList.Value>
              {c.createdBy?.name ?? '–'}, {formatDateTime(c.createdAt)}
            </DataList.Value>
          </DataList.Item>
          {c.reviewedAt ? (
            <DataList.Item>
              <DataList.Label>Reviewed</DataList.Label>
              <DataList.Value>
                {c.reviewedBy?.name ?? '–'}, {formatDateTime(c.reviewedAt)}
              </DataList.Value>
            </DataList.Item>
          ) : null}
        </DataList.Root>
      </Flex>
      {c.reviewComment ? (
        <Callout.Root color={c.status === 'returned' ? 'orange' : 'gray'} size="1">
          <Callout.Text>
            Reviewer’s comment: “{c.reviewComment}”
          </Callout.Text>
        </Callout.Root>
      ) : null}
      {c.status === 'approved' ? (
        <Text size="2" color="gray">
          Approved cases do not change. Copy the case to start a new draft.
        </Text>
      ) : null}
      <ReviewActions assetId={assetId} reservesCase={c} canEdit={canEdit} canReview={canReview} />
      <ReservesCaution text={c.caution} />
      <Tabs.Root value={tab} onValueChange={(t) => setTab(t as Tab)}>
        <Tabs.List>
          <Tabs.Trigger value="inputs">Sources and inputs</Tabs.Trigger>
          <Tabs.Trigger value="results">Results</Tabs.Trigger>
          <Tabs.Trigger value="cross-checks">Production cross-checks</Tabs.Trigger>
          <Tabs.Trigger value="inflow">Inflow</Tabs.Trigger>
        </Tabs.List>
        <Tabs.Content value="inputs" className="rc-tab">
          <Flex direction="column" gap="6">
            <SourcesPanel assetId={assetId} reservesCase={c} editable={editable} />
            <CaseInputsForm assetId={assetId} reservesCase={c} editable={editable} onRan={() => setTab('results')} />
          </Flex>
        </Tabs.Content>
        <Tabs.Content value="results" className="rc-tab">
          <ResultsPanel reservesCase={c} />
        </Tabs.Content>
        <Tabs.Content value="cross-checks" className="rc-tab">
          {crossChecks}
        </Tabs.Content>
        <Tabs.Content value="inflow" className="rc-tab">
          {inflow}
        </Tabs.Content>
      </Tabs.Root>
    </Flex>
  );
}
