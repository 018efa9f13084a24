/**
 * The command registry: every change to the coil document is one of these pure immer recipes, applied through
 * the store's dispatch(command, args) (ARCHITECTURE.md section 4). Each has a label for the undo history.
 */
import type { CoilDocument } from '@/lib/engine/types';
import { addBend } from './add-bend';
import { removeBend } from './remove-bend';
import { setCrossover } from './set-crossover';
import { toggleStub } from './toggle-stub';
import { eraseTubeEnd } from './erase-tube-end';
import { setGeometry } from './set-geometry';
import { setConditions } from './set-conditions';
import { replaceCircuiting } from './replace-circuiting';
import { renameCoil } from './rename-coil';

export const commands = {
  addBend,
  removeBend,
  setCrossover,
  toggleStub,
  eraseTubeEnd,
  setGeometry,
  setConditions,
  replaceCircuiting,
  renameCoil,
} satisfies Record<string, (doc: CoilDocument, args: never) => void>;

export type CommandName = keyof typeof commands;
export type CommandArgs<N extends CommandName> = Parameters<(typeof commands)[N]>[1];

export const commandLabels: Record<CommandName, string> = {
  addBend: 'Draw bend',
  removeBend: 'Remove bend',
  setCrossover: 'Crossover',
  toggleStub: 'Header stub',
  eraseTubeEnd: 'Erase',
  setGeometry: 'Geometry',
  setConditions: 'Conditions',
  replaceCircuiting: 'Circuiting',
  renameCoil: 'Rename',
};
