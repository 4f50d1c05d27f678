/**
 * A labelled file box that hands over the file chosen and then empties itself, so the same file can
 * be chosen again (after fixing it, say).
 */
export function FilePick({ className, label, accept, ariaLabel, onFile }: { className: string; label: string; accept: string; ariaLabel: string; onFile: (file: File) => void }) {
  return (
    <label className={className}>
      <span>{label}</span>
      <input
        type="file"
        accept={accept}
        aria-label={ariaLabel}
        onChange={(event) => {
          const file = event.target.files?.[0];
          event.target.value = '';
          if (file) onFile(file);
        }}
      />
    </label>
  );
}
