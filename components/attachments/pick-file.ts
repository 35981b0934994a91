import * as DocumentPicker from 'expo-document-picker';
import * as ImagePicker from 'expo-image-picker';
import { Platform } from 'react-native';
import type { PickedFile } from '../api/upload';

// The pickers must be opened straight from a press: a browser only shows its file dialog on a user's gesture.

/** One file from the device's documents; null when the person cancels. */
export async function pickDocument(types: string[]): Promise<PickedFile | null> {
  const res = await DocumentPicker.getDocumentAsync({ type: types, multiple: false, copyToCacheDirectory: true });
  const a = res.canceled ? null : res.assets?.[0];
  if (!a) return null;
  return { name: a.name, size: a.size ?? a.file?.size ?? null, mimeType: a.mimeType ?? null, uri: a.uri, file: a.file };
}

/** A CSV spec sheet (a browser also accepts the .csv ending: some systems give CSV files no type). */
export const pickCsv = () => pickDocument(Platform.OS === 'web' ? ['.csv', 'text/csv', 'text/comma-separated-values', 'text/plain'] : ['text/csv', 'text/comma-separated-values', 'text/plain']);

/** A PDF or a photo already on the device. */
export const pickPdfOrPhoto = () => pickDocument(['application/pdf', 'image/*']);

/**
 * A photo from the camera. In a browser this is the file input with capture (a phone opens its camera, a
 * desktop its file dialog); in the app, without a camera or its permission, the photo library instead.
 */
export async function takePhoto(): Promise<PickedFile | null> {
  const options: ImagePicker.ImagePickerOptions = { mediaTypes: ['images'], quality: 0.8 };
  let result: ImagePicker.ImagePickerResult;
  if (Platform.OS === 'web') {
    result = await ImagePicker.launchCameraAsync(options);
  } else {
    const permission = await ImagePicker.requestCameraPermissionsAsync().catch(() => null);
    try {
      result = permission?.granted ? await ImagePicker.launchCameraAsync(options) : await ImagePicker.launchImageLibraryAsync(options);
    } catch {
      result = await ImagePicker.launchImageLibraryAsync(options);
    }
  }
  const a = result.canceled ? null : result.assets?.[0];
  if (!a) return null;
  const mimeType = a.mimeType ?? 'image/jpeg';
  const name = a.fileName ?? `photo-${new Date().toISOString().replace(/[:.]/g, '-')}.${mimeType.split('/')[1] ?? 'jpg'}`;
  return { name, size: a.fileSize ?? a.file?.size ?? null, mimeType, uri: a.uri, file: a.file };
}

/** "812 B", "12 KB", "1.4 MB". */
export function formatSize(bytes: number | null | undefined): string {
  if (bytes == null) return '';
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}
