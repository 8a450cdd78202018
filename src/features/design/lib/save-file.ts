/**
 * Hands a file to the browser's download: a temporary object URL on a clicked link, released afterwards.
 *
 * @param blob - the file's bytes
 * @param name - the file name to save under
 */
export function saveFile(blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // Some browsers read the URL after click() returns; give them a moment before releasing it.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
