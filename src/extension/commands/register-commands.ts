// Binds the command table to handlers; one handler per id is required by the type.
import * as vscode from 'vscode';
import { COMMANDS } from './command-table';
import type { CommandId } from './command-table';

export type CommandHandlers = Record<CommandId, (...args: unknown[]) => unknown>;

export function registerCommands(handlers: CommandHandlers): vscode.Disposable[] {
  return COMMANDS.map((c) => vscode.commands.registerCommand(c.id, handlers[c.id]));
}
