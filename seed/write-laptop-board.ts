// Writes the synthetic notebook board for benchmarks and scale tests (not committed).
// Run: npx tsx seed/write-laptop-board.ts [directory] [--components N] [--seed N]
// Default directory: .railyard/laptop-board/ under the current directory (git-ignored).
import { mkdir, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { Command, InvalidArgumentError } from 'commander';
import { netlistBoardFiles } from './demo-board-files';
import {
  generateLaptopBoard,
  laptopBoardSeed,
  laptopDefaultComponents,
  laptopMinimumComponents,
} from './laptop-board';

function integer(name: string, minimum: number) {
  return (text: string): number => {
    const value = Number(text);
    if (!Number.isInteger(value) || value < minimum) {
      throw new InvalidArgumentError(
        `${name} must be an integer of at least ${minimum}, got '${text}'`,
      );
    }
    return value;
  };
}

const program = new Command()
  .name('write-laptop-board')
  .description('Write netlist.ipc, parts.csv and annotations.json of the synthetic notebook board')
  .argument('[directory]', 'where to write the files', join('.railyard', 'laptop-board'))
  .option(
    '--components <n>',
    'number of parts',
    integer('--components', laptopMinimumComponents),
    laptopDefaultComponents,
  )
  .option('--seed <n>', 'random seed', integer('--seed', 0), laptopBoardSeed)
  .parse();

const directory = resolve(program.args[0] ?? join('.railyard', 'laptop-board'));
const options = program.opts<{ components: number; seed: number }>();
const started = performance.now();
const board = generateLaptopBoard({ components: options.components, seed: options.seed });
const pins = board.components.reduce((sum, c) => sum + c.pins.length, 0);
await mkdir(directory, { recursive: true });
for (const file of netlistBoardFiles('.', board)) {
  await writeFile(join(directory, file.path), file.content);
}
console.log(
  `wrote ${board.components.length} parts, ${pins} pins to ${directory} in ${Math.round(performance.now() - started)} ms`,
);
