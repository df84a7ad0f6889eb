// The layer rules are enforced by ESLint (eslint.config.js): each probe below is a file placed in a
// layer, importing something that layer may or may not import. The forbidden ones must fail lint.
import { ESLint } from 'eslint';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));
let eslint: ESLint;

beforeAll(() => {
  eslint = new ESLint({ cwd: root });
});

/** Lints `code` as if it were the file `filePath` (relative to the project root) and returns the rule ids that fired. */
async function rulesFiredFor(filePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath: `${root}${filePath}` });
  return result.messages.map((message) => message.ruleId ?? `fatal: ${message.message}`);
}

describe('the layer boundaries', { timeout: 120_000 }, () => {
  it('refuses a domain file that imports react', async () => {
    const fired = await rulesFiredFor('src/domain/boundaryProbe.ts', "import { useState } from 'react';\nexport const probe = useState;\n");
    expect(fired).toContain('no-restricted-imports');
  });

  it('refuses a domain file that imports a client library module', async () => {
    const fired = await rulesFiredFor('src/domain/boundaryProbe.ts', "import { cn } from '../lib/cn';\nexport const probe = cn;\n");
    expect(fired).toContain('import-x/no-restricted-paths');
  });

  it('refuses a server file that imports a feature', async () => {
    const fired = await rulesFiredFor(
      'server/boundaryProbe.ts',
      "import { editorDesignQueryOptions } from '../src/features/editor/api/getEditorDesign';\nexport const probe = editorDesignQueryOptions;\n",
    );
    expect(fired).toContain('import-x/no-restricted-paths');
  });

  it('refuses one feature importing another', async () => {
    const fired = await rulesFiredFor(
      'src/features/designs/boundaryProbe.ts',
      "import { editorDesignQueryOptions } from '@/features/editor/api/getEditorDesign';\nexport const probe = editorDesignQueryOptions;\n",
    );
    expect(fired).toContain('import-x/no-restricted-paths');
  });

  it('refuses a shared library module that imports a feature', async () => {
    const fired = await rulesFiredFor(
      'src/lib/boundaryProbe.ts',
      "import { designsListQueryOptions } from '@/features/designs/api/listDesigns';\nexport const probe = designsListQueryOptions;\n",
    );
    expect(fired).toContain('import-x/no-restricted-paths');
  });

  it('refuses the database layer importing a route module', async () => {
    const fired = await rulesFiredFor(
      'server/db/boundaryProbe.ts',
      "import { designsRouter } from '../modules/designs/router';\nexport const probe = designsRouter;\n",
    );
    expect(fired).toContain('import-x/no-restricted-paths');
  });

  it('accepts the allowed directions: feature to domain, lib and its own files; server to domain', async () => {
    expect(
      await rulesFiredFor(
        'src/features/designs/boundaryProbe.ts',
        "import { roleSchema } from '@/domain/contracts';\nimport { cn } from '@/lib/cn';\nimport { designKeys } from '@/lib/queryKeys';\nimport { designsListQueryOptions } from './api/listDesigns';\nexport const probe = [roleSchema, cn, designKeys, designsListQueryOptions];\n",
      ),
    ).toEqual([]);
    expect(
      await rulesFiredFor('server/boundaryProbe.ts', "import { roleSchema } from '../src/domain/contracts';\nexport const probe = roleSchema;\n"),
    ).toEqual([]);
    expect(
      await rulesFiredFor('src/domain/boundaryProbe.ts', "import { z } from 'zod';\nimport { LENGTH_UNITS } from './units';\nexport const probe = z.enum(LENGTH_UNITS);\n"),
    ).toEqual([]);
  });
});
