// Every command, once. package.json's `contributes.commands`, `menus` and `keybindings` say the same
// (a unit test keeps them equal); activate.ts supplies one handler per id, so a command cannot be
// left unbound.

/** When clause true for the data languages (see data-files.ts). */
export const DATA_FILE_WHEN = 'resourceLangId =~ /^(csv|tsv|psv|ssv)$/';

/** The profile's panel is the active editor (its view type as the workbench names it ends in ours). */
export const PANEL_ACTIVE_WHEN = 'activeWebviewPanelId =~ /assay\\.panel$/';

/** A data file, or the panel showing one: commands that act on "the file's profile". */
export const PROFILE_WHEN = `${DATA_FILE_WHEN} || ${PANEL_ACTIVE_WHEN}`;

/** Keybindings act only while the keyboard is in a data file's editor. */
export const DATA_EDITOR_WHEN = 'editorTextFocus && editorLangId =~ /^(csv|tsv|psv|ssv)$/';

export interface CommandSpec {
  id: string;
  title: string;
  /** Codicon shown on the editor title bar, when the command has a button there. */
  icon?: string;
  /** Shown as a button on the title bar of data-file editors. */
  editorTitle?: boolean;
  /** When clause for the command palette (absent: always listed). */
  palette?: string;
  /**
   * Default keys (Linux and Windows, and macOS), bound only under DATA_EDITOR_WHEN. Chosen so that no
   * default keybinding of the workbench uses them (a workbench test checks the list it ships).
   */
  keys?: { key: string; mac: string };
}

export const COMMANDS = [
  { id: 'assay.openPanel', title: 'Open Profile to the Side', icon: '$(graph)', editorTitle: true },
  { id: 'assay.refresh', title: 'Profile the File Again', palette: DATA_FILE_WHEN },
  { id: 'assay.nextFlag', title: 'Next Flagged Cell', palette: DATA_FILE_WHEN, keys: { key: 'ctrl+alt+]', mac: 'ctrl+cmd+]' } },
  { id: 'assay.previousFlag', title: 'Previous Flagged Cell', palette: DATA_FILE_WHEN, keys: { key: 'ctrl+alt+[', mac: 'ctrl+cmd+[' } },
  { id: 'assay.listFlags', title: 'Show Flagged Cells...', palette: DATA_FILE_WHEN },
  { id: 'assay.limitFlagNavigation', title: 'Limit Next/Previous Flagged Cell to a Rule or Column...', palette: DATA_FILE_WHEN },
  { id: 'assay.showColumn', title: 'Show Column in the Profile...', palette: PROFILE_WHEN },
  { id: 'assay.copySummary', title: 'Copy Summary Table as Markdown', palette: PROFILE_WHEN },
  { id: 'assay.copyColumnSummary', title: 'Copy Column Summary as Markdown...', palette: PROFILE_WHEN },
  { id: 'assay.copyFrequencyTable', title: 'Copy Frequency Table as Markdown...', palette: PROFILE_WHEN },
  { id: 'assay.copyGroupedTable', title: 'Copy Grouped Frequency Table as Markdown...', palette: PROFILE_WHEN },
  { id: 'assay.copyGroupComparison', title: 'Copy Group Comparison as Markdown...', palette: PROFILE_WHEN },
  { id: 'assay.copyFlags', title: 'Copy Flags as Markdown', palette: PROFILE_WHEN },
  { id: 'assay.saveReport', title: 'Save Report as Markdown...', palette: PROFILE_WHEN },
  { id: 'assay.saveHtmlReport', title: 'Save Report as HTML...', palette: PROFILE_WHEN },
  { id: 'assay.writeMetadata', title: 'Write CSV on the Web Metadata from the Profile...', palette: PROFILE_WHEN },
] as const satisfies readonly CommandSpec[];

export type CommandId = (typeof COMMANDS)[number]['id'];

export const COMMAND_CATEGORY = 'Assay';
