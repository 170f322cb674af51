import { Callout, Flex, Spinner, Text } from '@radix-ui/themes';
import { useLogRunSamples } from '../api/get-log-run-samples';
import { DepthView } from './depth-view';

export interface LogRunDepthViewProps {
  assetId: string;
  wellId: string;
  wellName: string;
  runId: string;
}

/** Loads a log run's samples (binary curve bundle) and draws them in the depth view. */
export function LogRunDepthView({ assetId, wellId, wellName, runId }: LogRunDepthViewProps) {
  const samples = useLogRunSamples(assetId, wellId, runId);
  if (samples.isPending) {
    return (
      <Flex gap="2" align="center" p="4">
        <Spinner />
        <Text color="gray">Loading samples…</Text>
      </Flex>
    );
  }
  if (samples.isError) {
    return (
      <Callout.Root color="tomato" role="alert">
        <Callout.Text>Samples could not be loaded: {samples.error.message}</Callout.Text>
      </Callout.Root>
    );
  }
  const { index, curves } = samples.data;
  if (!curves.length) return <Text color="gray">This log run holds only its depth index.</Text>;
  return (
    <div className="depth-view-scroller">
      <DepthView wellName={wellName} depthUnit={index.unit} depth={index.values} curves={curves} />
    </div>
  );
}
