// Saves a blob under a file name through a temporary link (the browser's own download).

/** Starts the download of `blob` as `fileName`. */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // The click has read the URL synchronously; a tick later it can go.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
