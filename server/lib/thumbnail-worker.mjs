// Runs in a worker thread: decoding a 12-megapixel JPEG in pure JavaScript takes seconds, and the
// web server's one thread must keep answering meanwhile. Plain JavaScript so that it loads the same
// under tsx, vitest and a built server. One worker serves every request, one image at a time.
import { parentPort } from 'node:worker_threads';
import { Jimp } from 'jimp';

parentPort.on('message', async ({ id, bytes, edge, quality }) => {
  try {
    const image = await Jimp.read(Buffer.from(bytes));
    // Jimp turns the picture upright from its EXIF orientation as it reads it; a thumbnail keeps no EXIF.
    if (image.width > edge || image.height > edge) image.scaleToFit({ w: edge, h: edge });
    const out = await image.getBuffer('image/jpeg', { quality });
    parentPort.postMessage({ id, out }, [out.buffer]);
  } catch (err) {
    parentPort.postMessage({ id, error: err instanceof Error ? err.message : String(err) });
  }
});
