import sharp from 'sharp';
import { defaultCatalogue } from '../src/domain/catalogue';
const ids = process.argv.slice(2);
for (const id of ids) {
  const v = defaultCatalogue.variants.find((x) => x.id === id)!;
  const s = 10;
  const W = v.width * s + 20, H = v.height * s + 20;
  const path = (pts: [number, number][]) => 'M' + pts.map(([x, y]) => `${x * s + W / 2},${H / 2 - y * s}`).join('L') + 'Z';
  const d = [path(v.crossSection.outline), ...v.crossSection.holes.map(path)].join(' ');
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}"><rect width="100%" height="100%" fill="white"/><path d="${d}" fill="#888" fill-rule="evenodd" stroke="black" stroke-width="0.5"/></svg>`;
  await sharp(Buffer.from(svg)).png().toFile(`/tmp/eng-${id}.png`);
}
