import { useId, useState, type DragEvent, type ReactNode } from 'react';
import { cn } from '../lib/cn.ts';

/**
 * A native file input inside a box that also takes dropped files. Keyboard and screen-reader
 * users reach the input itself (Tab, then Enter or Space opens the picker); the box only adds
 * the drop target for a mouse.
 */
export function FileDropZone({
  label,
  hint,
  multiple = false,
  onFiles,
}: {
  label: string;
  hint: ReactNode;
  multiple?: boolean;
  onFiles: (files: File[]) => void;
}) {
  const id = `f${useId().replace(/:/g, '')}`;
  const [over, setOver] = useState(false);

  const onDragOver = (event: DragEvent<HTMLDivElement>) => {
    if (!event.dataTransfer.types.includes('Files')) return;
    event.preventDefault(); // without this the browser opens the dropped file instead
    event.dataTransfer.dropEffect = 'copy';
    setOver(true);
  };
  const onDragLeave = (event: DragEvent<HTMLDivElement>) => {
    // Moving over a child fires dragleave on the box too: only leaving the box counts.
    if (!event.currentTarget.contains(event.relatedTarget as Node | null)) setOver(false);
  };
  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setOver(false);
    const files = [...event.dataTransfer.files];
    onFiles(multiple ? files : files.slice(0, 1));
  };

  return (
    <div
      onDragEnter={onDragOver}
      onDragOver={onDragOver}
      onDragLeave={onDragLeave}
      onDrop={onDrop}
      className={cn(
        'rounded-md border-2 border-dashed px-5 py-5 transition-colors',
        over ? 'border-signal bg-signal-tint' : 'border-control bg-paper-raised',
      )}
    >
      <label htmlFor={id} className="block font-sans text-base font-semibold text-ink">
        {label}
      </label>
      <p id={`${id}-hint`} className="mt-1 font-sans text-sm text-ink-soft">
        <span className="font-semibold text-ink">
          {over ? 'Release to check.' : multiple ? 'Drop files on this box' : 'Drop a file on this box'}
        </span>
        {over ? null : <> or choose {multiple ? 'them' : 'it'} below. {hint}</>}
      </p>
      <input
        id={id}
        type="file"
        multiple={multiple}
        aria-describedby={`${id}-hint`}
        onChange={(event) => {
          onFiles([...(event.target.files ?? [])]);
          // Cleared so picking the same file again (after fixing it) checks it again.
          event.target.value = '';
        }}
        className={cn(
          'mt-3 block w-full font-sans text-sm text-ink-soft',
          'file:mr-3 file:min-h-11 file:cursor-pointer file:rounded file:border file:border-control',
          'file:bg-paper-raised file:px-4 file:font-sans file:text-sm file:font-semibold file:text-ink',
          'hover:file:bg-paper-sunk',
        )}
      />
    </div>
  );
}
