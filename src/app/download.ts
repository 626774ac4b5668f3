/** Browser downloads: a Blob (or data URL) handed to a temporary link. */
export function downloadText(fileName: string, text: string, mime: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: mime }));
  downloadUrl(fileName, url);
  // Revoke later: some browsers start the download after the click handler returns.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export function downloadUrl(fileName: string, url: string): void {
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.style.display = 'none';
  document.body.appendChild(a);
  a.click();
  a.remove();
}

/** A file name from a design name: letters, digits, dot, dash and underscore only. */
export function safeFileName(name: string, extension: string): string {
  const base = name.trim().replace(/[^A-Za-z0-9._-]+/g, '_') || 'cell';
  return `${base}${extension}`;
}
