import { saveBlob } from './api-client';

/**
 * Opens a file that needs the bearer token (a labels PDF, a delivery note) in a new tab, where the
 * browser's viewer prints it. The tab is opened at the click, before the download, so a popup
 * blocker lets it through; if it is blocked all the same, the file is downloaded instead.
 * Returns the file, so a caller can check it.
 */
export async function openFileInNewTab(load: () => Promise<Blob>, filename: string): Promise<Blob> {
  let tab: Window | null = null;
  try {
    tab = window.open('', '_blank');
  } catch {
    tab = null;
  }
  try {
    const blob = await load();
    if (tab && !tab.closed) {
      tab.location.href = URL.createObjectURL(blob);
    } else {
      saveBlob(blob, filename);
    }
    return blob;
  } catch (error) {
    tab?.close();
    throw error;
  }
}
