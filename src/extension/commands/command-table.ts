// Every command, once. package.json's `contributes.commands` and `menus` say the same (a unit test
// keeps them equal); activate.ts supplies one handler per id, so a command cannot be left unbound.
// Later commands (next/previous flag, list flags, copy as Markdown, save report) are added here.

/** When clause true for the data languages (see data-files.ts). */
export const DATA_FILE_WHEN = 'resourceLangId =~ /^(csv|tsv|psv|ssv)$/';

export interface CommandSpec {
  id: string;
  title: string;
  /** Codicon shown on the editor title bar, when the command has a button there. */
  icon?: string;
  /** Shown as a button on the title bar of data-file editors. */
  editorTitle?: boolean;
  /** When clause for the command palette (absent: always listed). */
  palette?: string;
}

export const COMMANDS = [
  { id: 'assay.openPanel', title: 'Open Profile to the Side', icon: '$(graph)', editorTitle: true },
  { id: 'assay.refresh', title: 'Profile the File Again', palette: DATA_FILE_WHEN },
] as const satisfies readonly CommandSpec[];

export type CommandId = (typeof COMMANDS)[number]['id'];

export const COMMAND_CATEGORY = 'Assay';
