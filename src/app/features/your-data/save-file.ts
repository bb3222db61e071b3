/** Hands a file to the browser to save (works offline: the bytes never leave the device). */
export function saveFile(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  // The click has started the download by the next task; then the URL can go.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

/** Lets the page paint (progress) between chunks of work. */
export const nextTask = () => new Promise<void>((resolve) => setTimeout(resolve, 0));
