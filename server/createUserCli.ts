// `npm run user:create -- --role owner [--email a@b.example] [--name "Full Name"]`: creates an
// account on the configured database, asking for what is missing; the password is always asked
// for (hidden on a terminal, or one line on standard input) and never taken from the command line.
import { createInterface } from 'node:readline';
import { Writable } from 'node:stream';
import { AppError } from './middleware/appError';
import { createPasswords } from './modules/auth/passwords';
import { createUserBodySchema } from './modules/users/schemas';
import { createUsersService } from './modules/users/service';
import type { Database } from './db/database';

export const CREATE_USER_USAGE = 'Usage: npm run user:create -- --role owner|designer|builder|customer|instructor [--email address] [--name "Display name"]';

function option(args: string[], name: string): string | undefined {
  const at = args.indexOf(`--${name}`);
  if (at >= 0) return args[at + 1];
  const inline = args.find((arg) => arg.startsWith(`--${name}=`));
  return inline?.slice(name.length + 3);
}

/** Reads answers from a terminal (password hidden) or, when piped, one line per question. */
function createPrompter() {
  let muted = false;
  const output = new Writable({
    write(chunk, _encoding, done) {
      if (!muted) process.stdout.write(chunk);
      done();
    },
  });
  const rl = createInterface({ input: process.stdin, output, terminal: Boolean(process.stdin.isTTY) });
  const lines: string[] = [];
  const waiting: ((line: string | undefined) => void)[] = [];
  let ended = false;
  rl.on('line', (line) => (waiting.length ? waiting.shift()!(line) : lines.push(line)));
  rl.on('close', () => {
    ended = true;
    while (waiting.length) waiting.shift()!(undefined);
  });
  const next = () => new Promise<string | undefined>((resolve) => (lines.length ? resolve(lines.shift()) : ended ? resolve(undefined) : waiting.push(resolve)));
  return {
    async ask(question: string, hidden = false): Promise<string> {
      process.stdout.write(question);
      muted = hidden;
      const answer = await next();
      muted = false;
      if (hidden) process.stdout.write('\n');
      if (answer === undefined) throw new Error('No answer was given (standard input ended).');
      return answer;
    },
    close: () => rl.close(),
  };
}

export async function createUserFromCommandLine(db: Database, args: string[]): Promise<number> {
  const role = option(args, 'role');
  if (!role) {
    console.error(CREATE_USER_USAGE);
    return 2;
  }
  const prompt = createPrompter();
  try {
    const email = option(args, 'email') ?? (await prompt.ask('Email address: '));
    const displayName = option(args, 'name') ?? (await prompt.ask('Display name: '));
    const password = await prompt.ask('Password (at least 10 characters, hard to guess): ', true);
    const again = await prompt.ask('The same password again: ', true);
    if (password !== again) {
      console.error('The two passwords differ. Nothing was created.');
      return 1;
    }
    const parsed = createUserBodySchema.safeParse({ email, displayName, role, password });
    if (!parsed.success) {
      for (const issue of parsed.error.issues) console.error(`${issue.path.join('.') || 'input'}: ${issue.message}`);
      console.error('Nothing was created.');
      return 1;
    }
    const user = await createUsersService(db, createPasswords()).create(parsed.data);
    console.log(`Created ${user.role} ${user.email} (${user.displayName}). Sign in at the server's address.`);
    return 0;
  } catch (error) {
    if (error instanceof AppError) {
      console.error(`${error.message} Nothing was created.`);
      return 1;
    }
    throw error;
  } finally {
    prompt.close();
  }
}
