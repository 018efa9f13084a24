/** Small previews of image attachments: about 320 px on the long edge, WebP, turned upright from EXIF. */
import sharp from 'sharp';

export const THUMBNAIL_EDGE_PX = 320;
export const THUMBNAIL_CONTENT_TYPE = 'image/webp';
/** Refuse decompression bombs: a 20 MB file may not unpack into more than this many pixels (~ a 100 MP photo). */
const MAX_INPUT_PIXELS = 100_000_000;

export async function makeThumbnail(bytes: Buffer): Promise<Buffer> {
  return sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS })
    .rotate()
    .resize(THUMBNAIL_EDGE_PX, THUMBNAIL_EDGE_PX, { fit: 'inside', withoutEnlargement: true })
    .webp({ quality: 76 })
    .toBuffer();
}
