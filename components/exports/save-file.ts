/**
 * Hands a downloaded file to the reader: on the web a temporary object URL and an <a download> click, which saves it
 * under the server's file name. The phone apps have no file-saving module installed, so they say so instead.
 */
import { Platform } from 'react-native';
import type { DownloadedFile } from '@/lib/api/exports';

export const CAN_SAVE_FILES = Platform.OS === 'web';

export function saveFile({ blob, fileName }: DownloadedFile): void {
  if (!CAN_SAVE_FILES || typeof document === 'undefined') {
    throw new Error('Downloads work in the web app. Open Tubeloom in a browser to save this file.');
  }
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.appendChild(link);
  link.click();
  link.remove();
  // Revoke after the click has been handled; revoking at once cancels the download in some browsers.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}
