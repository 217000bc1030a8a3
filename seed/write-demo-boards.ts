// Regenerates the committed demo boards in seed/boards/. Run: npx tsx seed/write-demo-boards.ts
import { mkdir, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { demoBoardFiles } from './demo-board-files';

const boardsDir = join(dirname(fileURLToPath(import.meta.url)), 'boards');

for (const file of demoBoardFiles()) {
  const target = join(boardsDir, file.path);
  await mkdir(dirname(target), { recursive: true });
  await writeFile(target, file.content);
  console.log(`wrote ${target} (${file.content.length} bytes)`);
}
