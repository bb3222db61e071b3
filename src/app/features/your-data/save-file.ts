/** Hands a file to the browser to save (works offline: the bytes never leave the device). */
export function saveFile(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  // Some browsers read the blob after the click's task: give them a minute before the URL goes.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

/** Lets the page paint (progress) between chunks of work. */
export const nextTask = () => new Promise<void>((resolve) => setTimeout(resolve, 0));
