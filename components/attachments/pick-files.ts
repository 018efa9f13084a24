/**
 * The two ways to choose files: the phone's photo library (expo-image-picker) and the system file picker
 * (expo-document-picker). Both give UploadSource items: the File on the web, a local URI on iOS and Android.
 */
import * as DocumentPicker from 'expo-document-picker';
import * as ImagePicker from 'expo-image-picker';
import type { UploadSource } from '@/lib/api/attachments';
import { ATTACHMENT_PICKER_TYPES } from '@/lib/schema/api-attachments';

/** At most this many files per pick, so one tap cannot queue a whole camera roll. */
const MAX_PER_PICK = 10;

function nameFromUri(uri: string, fallback: string): string {
  const last = uri.split(/[?#]/)[0].split('/').pop();
  return last && !last.startsWith('data:') && last.includes('.') ? decodeURIComponent(last) : fallback;
}

/** Photos from the library; null when the user cancelled. */
export async function pickPhotos(): Promise<UploadSource[] | null> {
  const result = await ImagePicker.launchImageLibraryAsync({
    mediaTypes: ['images'],
    allowsMultipleSelection: true,
    selectionLimit: MAX_PER_PICK,
    quality: 1,
    exif: false,
  });
  if (result.canceled) return null;
  return result.assets.slice(0, MAX_PER_PICK).map((a, i) => ({
    name: a.fileName ?? a.file?.name ?? nameFromUri(a.uri, `photo-${i + 1}.jpg`),
    mimeType: a.mimeType,
    size: a.fileSize ?? a.file?.size,
    file: a.file,
    uri: a.uri,
  }));
}

/** PDFs, photos, text or CSV from the file picker; null when the user cancelled. */
export async function pickDocuments(): Promise<UploadSource[] | null> {
  const result = await DocumentPicker.getDocumentAsync({
    type: ATTACHMENT_PICKER_TYPES,
    multiple: true,
    copyToCacheDirectory: true,
    // Web: a blob: URL instead of reading the whole file into a data: URL we never use.
    base64: false,
  });
  if (result.canceled) return null;
  return result.assets.slice(0, MAX_PER_PICK).map((a) => ({
    name: a.name,
    mimeType: a.mimeType,
    size: a.size ?? a.file?.size,
    file: a.file,
    uri: a.uri,
  }));
}
