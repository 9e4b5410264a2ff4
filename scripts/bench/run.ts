// Runs every bench in turn, or only those named after it (`npm run bench -- fit`). Add a bench by
// importing it and appending it to the list.
import { benchFit } from './fit';
import { benchGeometry } from './geometry';
import { benchForms } from './forms';
import { benchEditor } from './editor';
import { benchImages } from './images';
import { benchLimits } from './limits';
import { benchModels } from './models';

const benches: { name: string; run: () => Promise<void> }[] = [
  { name: 'geometry', run: benchGeometry },
  { name: 'forms', run: benchForms },
  { name: 'images', run: benchImages },
  { name: 'models', run: benchModels },
  { name: 'fit', run: benchFit },
  { name: 'editor', run: benchEditor },
  { name: 'limits', run: benchLimits },
];

const named = process.argv.slice(2);
const unknown = named.filter((name) => !benches.some((bench) => bench.name === name));
if (unknown.length > 0)
  throw new Error(`No bench named ${unknown.join(', ')}; the benches are ${benches.map((b) => b.name).join(', ')}`);
for (const bench of benches.filter((b) => named.length === 0 || named.includes(b.name))) {
  console.log(`# ${bench.name}`);
  await bench.run();
}
