import { shrinkAboveBytes, shrinkToEdge } from '../log-kinds';

/**
 * A phone's photo made smaller before it is sent: a 6 MB picture takes minutes on an allotment's
 * signal, and the server refuses anything over 8 MB. Small files, and browsers that cannot draw the
 * picture, send the original; the server checks the bytes either way.
 */
export async function shrinkPhoto(file: File): Promise<File> {
  if (file.size <= shrinkAboveBytes || !/^image\/(jpeg|png|webp)$/.test(file.type) || typeof createImageBitmap !== 'function') return file;
  try {
    const bitmap = await createImageBitmap(file, { imageOrientation: 'from-image' });
    const scale = Math.min(1, shrinkToEdge / Math.max(bitmap.width, bitmap.height));
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(bitmap.width * scale);
    canvas.height = Math.round(bitmap.height * scale);
    canvas.getContext('2d')?.drawImage(bitmap, 0, 0, canvas.width, canvas.height);
    bitmap.close();
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, 'image/jpeg', 0.85));
    if (!blob || blob.size >= file.size) return file;
    return new File([blob], file.name.replace(/\.\w+$/, '') + '.jpg', { type: 'image/jpeg' });
  } catch {
    return file; // The server still takes the original up to its limit.
  }
}
