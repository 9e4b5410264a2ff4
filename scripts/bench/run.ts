// Runs every bench in turn. Add a bench by importing it and appending it to the list.
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

for (const bench of benches) {
  console.log(`# ${bench.name}`);
  await bench.run();
}
