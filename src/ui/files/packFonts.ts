/** The tender pack's font, fetched from the app's own public/fonts (in the page or in a worker). */
import type { PackFonts } from '../../export/pdf/tenderPack.ts';

async function fontFile(base: string, name: string): Promise<string> {
  const response = await fetch(`${base}fonts/${name}`);
  if (!response.ok) throw new Error(`the font ${name} could not be fetched (${response.status})`);
  const bytes = new Uint8Array(await response.arrayBuffer());
  let binary = '';
  for (let k = 0; k < bytes.length; k += 0x8000)
    binary += String.fromCharCode(...bytes.subarray(k, k + 0x8000));
  return btoa(binary);
}

/** Both styles as base64 TrueType; `base` is the app's base URL ("/" unless deployed under a path). */
export async function fetchPackFonts(base: string): Promise<PackFonts> {
  const [regular, bold] = await Promise.all([
    fontFile(base, 'DejaVuSansCondensed.ttf'),
    fontFile(base, 'DejaVuSansCondensed-Bold.ttf'),
  ]);
  return { regular, bold };
}
