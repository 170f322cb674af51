import { Callout, Flex, Progress, Text } from '@radix-ui/themes';
import type { UploadResult } from '../../../types/api';
import { UploadResults } from './upload-results';

export interface UploadStatusProps {
  wellName: string;
  fileCount: number;
  /** Share of bytes sent, 0..1; null when no upload is running. */
  progress: number | null;
  error: Error | null;
  results: readonly UploadResult[] | undefined;
}

/** Progress bar while files travel, then the per-file results (or the request's error). */
export function UploadStatus({ wellName, fileCount, progress, error, results }: UploadStatusProps) {
  if (progress !== null) {
    const percent = Math.round(progress * 100);
    return (
      <Flex direction="column" gap="1" className="upload-status">
        <Text size="1" color="gray">
          {percent < 100
            ? `Sending ${fileCount} ${fileCount === 1 ? 'file' : 'files'}: ${percent}%`
            : `Checking ${fileCount === 1 ? 'the file' : `${fileCount} files`} on the server…`}
        </Text>
        <Progress value={percent} aria-label={`Upload progress for ${wellName}`} size="2" />
      </Flex>
    );
  }
  if (error) {
    return (
      <Callout.Root color="tomato" size="1" role="alert">
        <Callout.Text>Upload failed: {error.message}</Callout.Text>
      </Callout.Root>
    );
  }
  if (results) return <UploadResults wellName={wellName} results={results} />;
  return null;
}
