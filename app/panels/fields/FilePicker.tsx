/** A button-like label that opens the browser's file picker and hands over the file chosen. */
export function FilePicker({
  label,
  accept,
  testId,
  className,
  onFile,
}: {
  label: string;
  accept: string;
  testId: string;
  className: string;
  onFile(file: File): void;
}) {
  return (
    <label className={`file-button ${className}`}>
      {label}
      <input
        type="file"
        accept={accept}
        className="visually-hidden"
        data-testid={testId}
        onChange={(event) => {
          const file = event.currentTarget.files?.[0];
          if (file) onFile(file);
          // Cleared, so choosing the same file again opens it again.
          event.currentTarget.value = '';
        }}
      />
    </label>
  );
}
