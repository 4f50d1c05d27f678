import { Icon } from '@blueprintjs/core';
import { useRef, useState, type DragEvent } from 'react';

/** A place to drop a CSV file or workbook, or to pick one with the file chooser. */
export function CsvDropZone({ onFile, disabled }: { onFile: (file: File) => void; disabled?: boolean }) {
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  function drop(event: DragEvent) {
    event.preventDefault();
    setOver(false);
    const file = event.dataTransfer.files[0];
    if (file && !disabled) onFile(file);
  }
  return (
    <div
      className={over ? 'fr-drop-zone fr-drop-zone--over' : 'fr-drop-zone'}
      onDragOver={(event) => {
        event.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={drop}
    >
      <Icon icon="cloud-upload" size={28} />
      <label className="fr-drop-zone__label">
        <span>Drop the CSV file or .xlsx workbook here, or choose it:</span>
        <input
          ref={input}
          type="file"
          accept=".csv,.tsv,.txt,.xlsx,text/csv,text/plain,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
          aria-label="CSV file"
          disabled={disabled}
          onChange={(event) => {
            const file = event.target.files?.[0];
            if (file) onFile(file);
            // Choosing the same file again after fixing it must still count as a new choice.
            event.target.value = '';
          }}
        />
      </label>
    </div>
  );
}
