import sharp from 'sharp';

/** A real picture of one colour, made by sharp itself. */
export const picture = (
  width: number,
  height: number,
  colour: string,
  format: 'jpeg' | 'png' = 'jpeg',
) =>
  sharp({ create: { width, height, channels: 3, background: colour } })
    [format]()
    .toBuffer();
