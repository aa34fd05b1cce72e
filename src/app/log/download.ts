/**
 * Hands a file to the browser as a download: a Blob behind an object URL, clicked through an
 * <a download> made by script (the page's CSP allows no inline script, and needs none for this).
 */
export function downloadText(text: string, fileName: string, mimeType: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: mimeType }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.hidden = true;
  document.body.append(link);
  link.click();
  link.remove();
  // The download has started from the click; the URL is no longer needed after this turn.
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
