import { crc32 } from 'node:zlib';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { samplePdf } from '../../../../../tests/support/sample-files';
import { AppError } from '../../lib/app-error';
import { prepareAttachment } from './attachment-content';

/** Tag numbers in IFD0 of an EXIF block (TIFF 6.0 §2 layout: byte order, 42, IFD offset; 12-byte entries). */
function ifd0Tags(exif: Buffer): number[] {
  // sharp returns the APP1 payload, which starts with "Exif\0\0" before the TIFF header
  const tiff = exif.toString('latin1', 0, 6) === 'Exif\0\0' ? exif.subarray(6) : exif;
  const little = tiff.toString('latin1', 0, 2) === 'II';
  const u16 = (o: number) => (little ? tiff.readUInt16LE(o) : tiff.readUInt16BE(o));
  const u32 = (o: number) => (little ? tiff.readUInt32LE(o) : tiff.readUInt32BE(o));
  expect(u16(2)).toBe(42);
  const ifd = u32(4);
  return Array.from({ length: u16(ifd) }, (_, i) => u16(ifd + 2 + i * 12));
}

// EXIF 2.3 (CIPA DC-008) tag numbers [doc]: GPS IFD pointer 0x8825, camera maker 0x010f
const gpsIfdPointer = 0x8825;
const makeTag = 0x010f;

async function photoWithGps(): Promise<Buffer> {
  return sharp({
    create: { width: 64, height: 32, channels: 3, background: { r: 180, g: 120, b: 40 } },
  })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Bench camera', Software: 'test' },
      IFD3: {
        GPSLatitudeRef: 'N',
        GPSLatitude: '48/1 8/1 0/1',
        GPSLongitudeRef: 'E',
        GPSLongitude: '11/1 34/1 0/1',
      },
    })
    .toBuffer();
}

/** Left half red, right half blue, stored with an EXIF orientation. */
async function splitImage(orientation: number): Promise<Buffer> {
  const red = await sharp({ create: { width: 32, height: 32, channels: 3, background: '#ff0000' } })
    .png()
    .toBuffer();
  return sharp({ create: { width: 64, height: 32, channels: 3, background: '#0000ff' } })
    .composite([{ input: red, left: 0, top: 0 }])
    .jpeg({ quality: 95 })
    .withMetadata({ orientation })
    .toBuffer();
}

async function pixel(image: Buffer, x: number, y: number): Promise<[number, number, number]> {
  const { data, info } = await sharp(image).raw().toBuffer({ resolveWithObject: true });
  const at = (y * info.width + x) * info.channels;
  return [data[at]!, data[at + 1]!, data[at + 2]!];
}

/** A one-entry ZIP archive, stored (PKWARE APPNOTE 6.3: local header, data, central directory, end record). */
function zipWith(name: string, content: Buffer): Buffer {
  const n = Buffer.from(name);
  const crc = crc32(content);
  const local = Buffer.alloc(30);
  local.writeUInt32LE(0x04034b50, 0);
  local.writeUInt16LE(20, 4);
  local.writeUInt32LE(crc, 14);
  local.writeUInt32LE(content.length, 18);
  local.writeUInt32LE(content.length, 22);
  local.writeUInt16LE(n.length, 26);
  const central = Buffer.alloc(46);
  central.writeUInt32LE(0x02014b50, 0);
  central.writeUInt16LE(20, 4);
  central.writeUInt16LE(20, 6);
  central.writeUInt32LE(crc, 16);
  central.writeUInt32LE(content.length, 20);
  central.writeUInt32LE(content.length, 24);
  central.writeUInt16LE(n.length, 28);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(1, 8);
  end.writeUInt16LE(1, 10);
  end.writeUInt32LE(46 + n.length, 12);
  end.writeUInt32LE(30 + n.length + content.length, 16);
  return Buffer.concat([local, n, content, central, n, end]);
}

async function refusal(promise: Promise<unknown>): Promise<AppError> {
  const err = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(AppError);
  return err as AppError;
}

describe('prepareAttachment', () => {
  it('removes the GPS position and every other EXIF field from a JPEG and from its thumbnail', async () => {
    const original = await photoWithGps();
    const before = await sharp(original).metadata();
    expect(ifd0Tags(before.exif!)).toEqual(expect.arrayContaining([gpsIfdPointer, makeTag]));

    const prepared = await prepareAttachment({ name: 'short-on-vsys.jpg', bytes: original });

    expect(prepared.contentType).toBe('image/jpeg');
    for (const image of [prepared.bytes, prepared.thumbnail!]) {
      const after = await sharp(image).metadata();
      expect(after.exif).toBeUndefined();
      expect(after.xmp).toBeUndefined();
      expect(after.iptc).toBeUndefined();
    }
    // the APP1 marker (JPEG, ITU T.81 + EXIF 2.3: 0xFFE1 followed by "Exif") is gone from the bytes themselves
    expect(prepared.bytes.includes(Buffer.from('Exif\0\0'))).toBe(false);
  });

  it('applies the EXIF orientation to the pixels, since the tag that carried it is dropped', async () => {
    // orientation 6 (EXIF 2.3 tag 0x0112): the stored image is shown turned 90° clockwise [doc],
    // so the stored left (red) half becomes the top
    const prepared = await prepareAttachment({ name: 'sideways.jpg', bytes: await splitImage(6) });

    expect({ width: prepared.width, height: prepared.height }).toEqual({ width: 32, height: 64 });
    const top = await pixel(prepared.bytes, 16, 4);
    const bottom = await pixel(prepared.bytes, 16, 60);
    expect(top[0]).toBeGreaterThan(200);
    expect(top[2]).toBeLessThan(60);
    expect(bottom[2]).toBeGreaterThan(200);
    expect(bottom[0]).toBeLessThan(60);
  });

  it('makes a WebP thumbnail at most 480 px on its longer side, keeping the proportions', async () => {
    const wide = await sharp({
      create: { width: 2000, height: 1000, channels: 3, background: '#224466' },
    })
      .png()
      .toBuffer();

    const prepared = await prepareAttachment({ name: 'thermal.png', bytes: wide });

    expect(await fileTypeFromBuffer(prepared.thumbnail!)).toEqual({
      ext: 'webp',
      mime: 'image/webp',
    });
    const thumb = await sharp(prepared.thumbnail!).metadata();
    expect({ width: thumb.width, height: thumb.height }).toEqual({ width: 480, height: 240 });
    expect({ width: prepared.width, height: prepared.height }).toEqual({
      width: 2000,
      height: 1000,
    });
  });

  it('does not enlarge an image smaller than a thumbnail', async () => {
    const small = await sharp({
      create: { width: 100, height: 60, channels: 4, background: '#22446680' },
    })
      .webp()
      .toBuffer();
    const prepared = await prepareAttachment({ name: 'tiny.webp', bytes: small });
    const thumb = await sharp(prepared.thumbnail!).metadata();
    expect({ width: thumb.width, height: thumb.height }).toEqual({ width: 100, height: 60 });
  });

  it('keeps every frame of an animated GIF', async () => {
    const colours = ['#ff0000', '#00ff00', '#0000ff'];
    const stills = await Promise.all(
      colours.map((c) =>
        sharp({ create: { width: 20, height: 20, channels: 3, background: c } })
          .png()
          .toBuffer(),
      ),
    );
    const frames = await sharp(stills, { join: { animated: true } })
      .gif({ loop: 0 })
      .toBuffer();
    expect((await sharp(frames, { animated: true }).metadata()).pages).toBe(3);

    const prepared = await prepareAttachment({ name: 'scope-trace.gif', bytes: frames });

    const meta = await sharp(prepared.bytes, { animated: true }).metadata();
    expect(meta.format).toBe('gif');
    expect(meta.pages).toBe(3);
    expect({ width: prepared.width, height: prepared.height }).toEqual({ width: 20, height: 20 });
  });

  it('drops bytes appended after the image data, such as markup hidden in a JPEG', async () => {
    const polyglot = Buffer.concat([
      await photoWithGps(),
      Buffer.from('<html><script>alert(1)</script></html>'),
    ]);
    const prepared = await prepareAttachment({ name: 'photo.jpg', bytes: polyglot });
    expect(prepared.bytes.includes(Buffer.from('<script>'))).toBe(false);
  });

  it('keeps a PDF as uploaded and makes no thumbnail for it', async () => {
    const pdf = samplePdf();
    const prepared = await prepareAttachment({ name: 'ldo-datasheet.pdf', bytes: pdf });
    expect(prepared).toMatchObject({
      contentType: 'application/pdf',
      thumbnail: null,
      width: null,
      height: null,
      originalName: 'ldo-datasheet.pdf',
    });
    expect(prepared.bytes.equals(pdf)).toBe(true);
  });

  it.each([
    [
      'an HTML page',
      Buffer.from('<!doctype html><html><body><script>document.cookie</script></body></html>'),
    ],
    [
      'an SVG drawing',
      Buffer.from(
        '<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"><rect width="9" height="9"/></svg>',
      ),
    ],
    ['a ZIP archive', zipWith('readme.txt', Buffer.from('not a photo'))],
  ])('refuses %s named photo.jpg with 415, naming the file', async (_what, bytes) => {
    const err = await refusal(prepareAttachment({ name: 'photo.jpg', bytes }));
    expect(err.status).toBe(415);
    expect(err.message).toMatch(/^"photo\.jpg" is not a JPEG, PNG, WebP, GIF or PDF file/);
  });

  it('says what the content really is when it recognises it', async () => {
    const err = await refusal(
      prepareAttachment({ name: 'photo.jpg', bytes: zipWith('a.txt', Buffer.from('x')) }),
    );
    expect(err.message).toContain('its content is application/zip');
    expect(err.details).toEqual({ file: 'photo.jpg', detected: 'application/zip' });
  });

  it('refuses a file that starts like a JPEG but cannot be decoded', async () => {
    // SOI, then an APP0 "JFIF" segment start (ITU T.81 / JFIF 1.02), then nothing decodable
    const broken = Buffer.concat([
      Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10]),
      Buffer.from('JFIF\0'),
      Buffer.alloc(64, 0x41),
    ]);
    const err = await refusal(prepareAttachment({ name: 'board-top.jpg', bytes: broken }));
    expect(err.status).toBe(415);
    expect(err.message).toMatch(/^"board-top\.jpg" looks like a JPEG image but cannot be read/);
  });

  it('refuses an empty file', async () => {
    const err = await refusal(prepareAttachment({ name: 'empty.png', bytes: Buffer.alloc(0) }));
    expect(err.status).toBe(415);
    expect(err.message).toBe('"empty.png" is empty');
  });

  it('names the stored file after what it is, not what it was called', async () => {
    const png = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#000' } })
      .png()
      .toBuffer();
    const prepared = await prepareAttachment({ name: '../../etc/passwd/photo.jpg', bytes: png });
    expect(prepared.contentType).toBe('image/png');
    expect(prepared.originalName).toBe('photo.png');
  });
});
