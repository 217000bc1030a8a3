// `npm run railyard -- import <file> --board <slug> ...`: imports a netlist from the command line.
import { Command, Option } from 'commander';
import {
  boardSlugSchema,
  netlistFormats,
  userRoleSchema,
  userRoles,
  type ImportIssue,
} from '@railyard/shared';
import { createServices } from './app';
import { readEnv } from './config/env';
import { createPool } from './db/client';
import { AppError } from './lib/app-error';
import { createLogger } from './lib/logger';
import { importFromDisk } from './modules/imports/import-files';

function printIssues(label: string, issues: ImportIssue[]) {
  for (const i of issues) {
    const where = [
      i.file,
      i.line !== null ? `line ${i.line}` : null,
      i.field ? `field ${i.field}` : null,
    ]
      .filter(Boolean)
      .join(', ');
    console.error(`${label}${where ? ` (${where})` : ''}: ${i.message}`);
  }
}

/** Runs a command with the services on DATABASE_URL, and closes the pool after it. */
async function withServices(run: (services: ReturnType<typeof createServices>) => Promise<void>) {
  if (!process.env.DATABASE_URL) {
    console.error('DATABASE_URL is not set (npm run railyard sets it for the local cluster).');
    process.exitCode = 2;
    return;
  }
  const env = readEnv(process.env);
  const pool = createPool(env.DATABASE_URL);
  try {
    await run(createServices({ env, pool, logger: createLogger('warn') }));
  } finally {
    await pool.end();
  }
}

const program = new Command('railyard').description('Railyard command-line tools');

program
  .command('import')
  .description('import a board netlist (IPC-D-356, pin-list CSV or railyard-board JSON)')
  .argument('<file>', 'the netlist file')
  .requiredOption('--board <slug>', 'the board slug (lower-case letters, digits and hyphens)')
  .addOption(
    new Option('--format <format>', 'the netlist format (detected when omitted)').choices(
      netlistFormats,
    ),
  )
  .option('--parts <file>', 'a parts CSV (refdes,value,package) adding values and packages')
  .option(
    '--annotations <file>',
    'a railyard-annotations JSON file (voltages, converter and switch links)',
  )
  .option('--title <title>', 'the board title, for a new board')
  .option(
    '--replace',
    "replace the board's netlist, keeping entered annotations whose nets still exist",
    false,
  )
  .action(async (file: string, opts) => {
    const slug = boardSlugSchema.safeParse(opts.board);
    if (!slug.success) {
      console.error(`--board "${opts.board}": ${slug.error.issues[0]?.message}`);
      process.exitCode = 2;
      return;
    }
    await withServices(async (services) => {
      try {
        const job = await importFromDisk(services.imports, {
          slug: slug.data,
          format: opts.format,
          replace: opts.replace,
          meta: opts.title ? { title: opts.title } : undefined,
          netlist: file,
          parts: opts.parts,
          annotations: opts.annotations,
          enteredBy: 'import:cli',
        });
        printIssues('warning', job.warnings);
        if (job.status !== 'succeeded' || !job.summary) {
          printIssues('error', job.errors);
          process.exitCode = 1;
          return;
        }
        const s = job.summary;
        console.log(
          `${s.replaced ? 'Replaced' : 'Imported'} ${slug.data}: ${s.nets} nets, ${s.components} components, ` +
            `${s.pins} pins, ${s.powerLinks} power links; root ${s.rootNet ?? '(none)'}; ground ${s.groundNets.join(', ') || '(none)'}`,
        );
        for (const d of s.dropped) console.log(`dropped: ${d}`);
      } catch (error) {
        if (!(error instanceof AppError)) throw error;
        console.error(error.message);
        const details = error.details as
          { errors?: ImportIssue[]; warnings?: ImportIssue[] } | undefined;
        printIssues('error', details?.errors ?? []);
        printIssues('warning', details?.warnings ?? []);
        process.exitCode = 1;
      }
    });
  });

program
  .command('role')
  .description(
    "set a user's role (the first admin of a fresh database is named this way or by RAILYARD_ADMINS)",
  )
  .argument('<user>', 'GitHub login or numeric GitHub id of someone who has signed in once')
  .argument('<role>', `one of ${userRoles.join(', ')}`)
  .option('--reason <text>', 'why, for the audit log', 'set from the command line')
  .action(async (who: string, role: string, opts: { reason: string }) => {
    const parsedRole = userRoleSchema.safeParse(role);
    if (!parsedRole.success) {
      console.error(`role "${role}": choose one of ${userRoles.join(', ')}`);
      process.exitCode = 2;
      return;
    }
    await withServices(async ({ users }) => {
      const user = await users.findByLoginOrGitHubId(who);
      if (!user) {
        console.error(`No user "${who}": they must sign in once before they can be given a role.`);
        process.exitCode = 1;
        return;
      }
      const updated = await users.update(
        user,
        { role: parsedRole.data, reason: opts.reason },
        null,
      );
      console.log(`${updated.login} is now ${updated.role}`);
    });
  });

await program.parseAsync();
