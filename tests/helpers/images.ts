import sharp from 'sharp';

const base = (width: number, height: number) =>
  sharp({ create: { width, height, channels: 3, background: { r: 40, g: 120, b: 160 } } });

/** A real JPEG carrying EXIF, including a made-up camera position, to prove it is stripped. */
export function jpegWithExif(width = 800, height = 600): Promise<Buffer> {
  return base(width, height)
    .jpeg()
    .withMetadata({
      exif: {
        IFD0: { Artist: 'Invented Tester', Copyright: 'test data' },
        IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1' },
      },
    })
    .toBuffer();
}

export function png(width = 64, height = 48): Promise<Buffer> {
  return base(width, height).png().toBuffer();
}
