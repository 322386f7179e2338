import { type Page } from 'playwright-core';
import sharp from 'sharp';

import { demoSignIns } from '@/server/demo/demo-studio';

/** Fills in the sign-in form already on the page and sends it, as a person would. */
export async function fillSignIn(
  page: Page,
  email: string,
  password: string = demoSignIns.password,
) {
  await page.getByTestId('sign-in-screen').waitFor();
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
}

/** Signs in through the form, as a person would, and waits for the studio's overview. */
export async function signInToStudio(
  page: Page,
  url: string,
  email: string = demoSignIns.people[0].email,
) {
  await page.goto(`${url}/sign-in`);
  await fillSignIn(page, email);
  await page.getByTestId('overview-screen').waitFor();
}

/** A small real photograph-like image: a glaze-coloured gradient, encoded by sharp. */
export async function makeImage(format: 'png' | 'jpeg', colour: [number, number, number]) {
  const width = 320;
  const height = 320;
  const pixels = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y += 1) {
    for (let x = 0; x < width; x += 1) {
      const shade = 0.6 + (0.4 * (x + y)) / (width + height);
      const i = (y * width + x) * 3;
      pixels[i] = Math.round(colour[0] * shade);
      pixels[i + 1] = Math.round(colour[1] * shade);
      pixels[i + 2] = Math.round(colour[2] * shade);
    }
  }
  const image = sharp(pixels, { raw: { width, height, channels: 3 } });
  return format === 'png' ? image.png().toBuffer() : image.jpeg({ quality: 85 }).toBuffer();
}

/** Opens a section from the navigation: on a phone, through More when the bar has no room. */
export async function openSection(page: Page, key: string) {
  const direct = page.getByTestId(`nav-${key}`);
  if (await direct.isVisible()) {
    await direct.click();
    return;
  }
  await page.getByTestId('nav-more').click();
  await page.getByTestId(`more-${key}`).click();
}
