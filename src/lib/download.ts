/** Starts a browser download of `blob` under `fileName`. */
export function downloadBlob(fileName: string, blob: Blob): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.appendChild(link);
  link.click();
  link.remove();
  // Revoke later: some browsers start the download after the click handler returns.
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** A file name for an export of a design: its name in lower case with dashes, then `.extension`. */
export function exportFileName(designName: string, extension: string): string {
  return `${designName.replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '').toLowerCase() || 'design'}.${extension}`;
}
