/** Hands a downloaded file to the browser to save, under its name. */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  // The click starts the save synchronously; the URL can go once the browser has taken the blob.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}
