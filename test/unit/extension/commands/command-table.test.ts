// package.json declares exactly the commands of the table, with the same titles, icons and menus.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { COMMAND_CATEGORY, COMMANDS, DATA_EDITOR_WHEN, DATA_FILE_WHEN, PROFILE_WHEN } from '../../../../src/extension/commands/command-table';
import type { CommandSpec } from '../../../../src/extension/commands/command-table';
import { DATA_LANGUAGES } from '../../../../src/extension/data-files';

interface Manifest {
  activationEvents: string[];
  contributes: {
    commands: { command: string; title: string; category: string; icon?: string }[];
    menus: Record<string, { command: string; when?: string; group?: string }[]>;
    keybindings: { command: string; key: string; mac: string; when: string }[];
    languages: { id: string; extensions: string[] }[];
  };
}
const pkg = JSON.parse(readFileSync(join(__dirname, '../../../../package.json'), 'utf8')) as Manifest;
const table: readonly CommandSpec[] = COMMANDS;

describe('command table and package.json', () => {
  it('declares the same commands, titles, category and icons', () => {
    expect(pkg.contributes.commands).toEqual(table.map((c) => ({
      command: c.id, title: c.title, category: COMMAND_CATEGORY, ...(c.icon !== undefined ? { icon: c.icon } : {}),
    })));
  });

  it('puts the editor-title buttons on data files only, and limits palette entries as the table says', () => {
    expect(pkg.contributes.menus['editor/title']).toEqual(table.filter((c) => c.editorTitle).map((c) => ({ command: c.id, when: DATA_FILE_WHEN, group: 'navigation' })));
    expect(pkg.contributes.menus.commandPalette).toEqual(table.filter((c) => c.palette !== undefined).map((c) => ({ command: c.id, when: c.palette })));
  });

  it('binds the default keys of the table, only while a data file\'s editor has the keyboard', () => {
    expect(pkg.contributes.keybindings).toEqual(table.filter((c) => c.keys !== undefined).map((c) => ({ command: c.id, key: c.keys!.key, mac: c.keys!.mac, when: DATA_EDITOR_WHEN })));
    expect(DATA_EDITOR_WHEN).toBe(`editorTextFocus && editorLangId =~ /^(${DATA_LANGUAGES.join('|')})$/`);
    expect(PROFILE_WHEN.startsWith(`${DATA_FILE_WHEN} || `)).toBe(true);
    // Two commands never share keys.
    const keys = pkg.contributes.keybindings.flatMap((k) => [k.key, `mac:${k.mac}`]);
    expect(new Set(keys).size).toBe(keys.length);
  });

  it('the data-file when clause, the contributed languages and the activation events name the same languages', () => {
    expect(DATA_FILE_WHEN).toBe(`resourceLangId =~ /^(${DATA_LANGUAGES.join('|')})$/`);
    expect(pkg.contributes.languages.map((l) => l.id)).toEqual([...DATA_LANGUAGES]);
    expect(pkg.activationEvents.filter((e) => e.startsWith('onLanguage:'))).toEqual(DATA_LANGUAGES.map((l) => `onLanguage:${l}`));
    expect(pkg.activationEvents).toContain('onWebviewPanel:assay.panel');
  });

  it('uses the assay. namespace for every command', () => {
    for (const c of table) expect(c.id).toMatch(/^assay\.[a-z][A-Za-z]+$/);
  });
});
