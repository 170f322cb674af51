import { Text } from '@radix-ui/themes';
import { useId, useState, type DragEvent } from 'react';

export interface LasDropZoneProps {
  wellName: string;
  disabled?: boolean;
  onFiles: (files: File[]) => void;
}

/**
 * Drop target and file picker for LAS files of one well. The file input itself stays in the page
 * (visually hidden, still focusable) and carries the accessible name "LAS files for <well>".
 */
export function LasDropZone({ wellName, disabled = false, onFiles }: LasDropZoneProps) {
  const inputId = useId();
  const [over, setOver] = useState(false);

  const accept = (event: DragEvent<HTMLDivElement>) => {
    if (disabled || !Array.from(event.dataTransfer.types).includes('Files')) return;
    event.preventDefault();
    event.dataTransfer.dropEffect = 'copy';
    setOver(true);
  };

  const drop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setOver(false);
    if (disabled) return;
    const files = Array.from(event.dataTransfer.files);
    if (files.length) onFiles(files);
  };

  return (
    <div
      role="group"
      aria-label={`Drop zone for ${wellName}`}
      className="drop-zone"
      data-over={over || undefined}
      data-disabled={disabled || undefined}
      onDragEnter={accept}
      onDragOver={accept}
      onDragLeave={() => setOver(false)}
      onDrop={drop}
    >
      <input
        id={inputId}
        type="file"
        multiple
        accept=".las,.LAS"
        className="visually-hidden"
        aria-label={`LAS files for ${wellName}`}
        disabled={disabled}
        onChange={(event) => {
          const files = Array.from(event.currentTarget.files ?? []);
          event.currentTarget.value = '';
          if (files.length) onFiles(files);
        }}
      />
      <label htmlFor={inputId} className="drop-zone__label">
        <Text size="1">
          {over ? 'Release to load' : 'Drop LAS files or '}
          {over ? null : <span className="drop-zone__browse">browse</span>}
        </Text>
      </label>
    </div>
  );
}
