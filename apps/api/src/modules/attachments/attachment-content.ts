// What an upload really is, decided from its bytes (never its name or the client's Content-Type), and
// what Railyard keeps of it. Images are decoded and encoded again: that applies the EXIF orientation
// and drops every metadata block (EXIF with GPS position and camera serial, XMP, IPTC, comments) and
// anything appended after the image data. sharp cannot remove metadata without re-encoding, and a
// lossless JPEG rewrite would need another tool; at quality 90 the loss is not visible on board photos.
// Radiometric data some thermal cameras hide in metadata is dropped too: the picture is kept, not the
// per-pixel temperatures. PDFs cannot be cleaned this way and are kept as uploaded; they are only ever
// served as downloads in a sandbox (see attachments.routes.ts).
import { fileTypeFromBuffer } from 'file-type';
import sharp, { type Metadata } from 'sharp';
import { AppError } from '../../lib/app-error';
import { cleanFileName } from './attachment-filename';

export const allowedTypes = {
  'image/jpeg': { label: 'JPEG', extension: 'jpg', format: 'jpeg' },
  'image/png': { label: 'PNG', extension: 'png', format: 'png' },
  'image/webp': { label: 'WebP', extension: 'webp', format: 'webp' },
  'image/gif': { label: 'GIF', extension: 'gif', format: 'gif' },
  'application/pdf': { label: 'PDF', extension: 'pdf', format: null },
} as const;

export type AttachmentType = keyof typeof allowedTypes;

export const thumbnailMaxPixels = 480;
export const thumbnailType = 'image/webp';
/** 100 megapixels: more than any camera a bench uses, far below what would exhaust memory on decode. */
export const maxImagePixels = 100_000_000;

export interface UploadedFile {
  name: string;
  bytes: Buffer;
}

export interface PreparedAttachment {
  originalName: string;
  contentType: AttachmentType;
  /** what is stored and served: the re-encoded image, or the PDF as uploaded */
  bytes: Buffer;
  /** WebP, at most 480 px on its longer side; null for PDF */
  thumbnail: Buffer | null;
  width: number | null;
  height: number | null;
}

const allowedList = 'JPEG, PNG, WebP, GIF or PDF';

function sniffedType(mime: string | undefined): AttachmentType | null {
  // an animated PNG is still a PNG; it is kept as its first frame (libvips reads no APNG animation)
  if (mime === 'image/apng') return 'image/png';
  return mime !== undefined && mime in allowedTypes ? (mime as AttachmentType) : null;
}

function quoted(name: string): string {
  return JSON.stringify(name.length > 200 ? `${name.slice(0, 200)}…` : name);
}

async function reencode(file: UploadedFile, type: Exclude<AttachmentType, 'application/pdf'>) {
  const expected = allowedTypes[type];
  const animated = type === 'image/gif' || type === 'image/webp';
  const options = { animated, limitInputPixels: maxImagePixels, failOn: 'error' as const };
  let meta: Metadata;
  try {
    meta = await sharp(file.bytes, options).metadata();
  } catch (err) {
    throw unreadable(file, expected.label, err);
  }
  if (meta.format !== expected.format) {
    throw unreadable(file, expected.label, new Error(`the decoder read it as ${meta.format}`));
  }
  const frames = meta.pages ?? 1;
  const frameHeight = meta.pageHeight ?? meta.height;
  if (meta.width * frameHeight * frames > maxImagePixels) {
    throw new AppError(
      413,
      'image_too_large',
      `${quoted(file.name)} has more than ${maxImagePixels / 1_000_000} million pixels`,
      { file: file.name },
    );
  }

  try {
    // EXIF orientation applies to still images; animated GIF and WebP frames carry none
    const still = frames === 1;
    let pipeline = sharp(file.bytes, options);
    if (still) pipeline = pipeline.autoOrient();
    switch (type) {
      case 'image/jpeg':
        pipeline = pipeline.jpeg({ quality: 90, mozjpeg: true });
        break;
      case 'image/png':
        pipeline = pipeline.png();
        break;
      case 'image/webp':
        pipeline = pipeline.webp({ quality: 90 });
        break;
      case 'image/gif':
        pipeline = pipeline.gif();
        break;
    }
    // no keepMetadata()/withMetadata(): sharp writes no EXIF, XMP or IPTC unless asked to
    const bytes = await pipeline.toBuffer();
    const thumbnail = await sharp(file.bytes, { ...options, animated: false })
      .autoOrient()
      .resize({
        width: thumbnailMaxPixels,
        height: thumbnailMaxPixels,
        fit: 'inside',
        withoutEnlargement: true,
      })
      .webp({ quality: 80 })
      .toBuffer();
    const oriented = still ? meta.autoOrient : { width: meta.width, height: frameHeight };
    return { bytes, thumbnail, width: oriented.width, height: oriented.height };
  } catch (err) {
    throw unreadable(file, expected.label, err);
  }
}

function unreadable(file: UploadedFile, label: string, err: unknown): AppError {
  const reason = err instanceof Error ? err.message.split('\n')[0] : String(err);
  return new AppError(
    415,
    'unreadable_file',
    `${quoted(file.name)} looks like a ${label} image but cannot be read: ${reason}`,
    {
      file: file.name,
    },
  );
}

/**
 * Checks one uploaded file and returns what to store. Throws 415 naming the file when the bytes are not
 * one of the allowed types (whatever the name says) or an image cannot be decoded.
 */
export async function prepareAttachment(file: UploadedFile): Promise<PreparedAttachment> {
  if (file.bytes.length === 0) {
    throw new AppError(415, 'unsupported_media_type', `${quoted(file.name)} is empty`, {
      file: file.name,
    });
  }
  const detected = await fileTypeFromBuffer(file.bytes);
  const type = sniffedType(detected?.mime);
  if (!type) {
    const what = detected
      ? `its content is ${detected.mime}`
      : 'its content is not a recognised binary format';
    throw new AppError(
      415,
      'unsupported_media_type',
      `${quoted(file.name)} is not a ${allowedList} file (${what})`,
      {
        file: file.name,
        detected: detected?.mime ?? null,
      },
    );
  }
  const originalName = cleanFileName(file.name, allowedTypes[type].extension);
  if (type === 'application/pdf') {
    return {
      originalName,
      contentType: type,
      bytes: file.bytes,
      thumbnail: null,
      width: null,
      height: null,
    };
  }
  const image = await reencode(file, type);
  return { originalName, contentType: type, ...image };
}
