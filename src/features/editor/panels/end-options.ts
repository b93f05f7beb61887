import type { EndSpec } from '../../../../shared/schemas/spool-design-node.schema';

/** The open-end components a user picks from. */
export type EndChoice = EndSpec['type'];

export const END_OPTIONS: { value: EndChoice; label: string }[] = [
  { value: 'weld-neck-flange', label: 'Weld-neck flange' },
  { value: 'slip-on-flange', label: 'Slip-on flange' },
  { value: 'bevel', label: 'Bevel end (field weld)' },
  { value: 'plain', label: 'Plain end' },
  { value: 'cap', label: 'Cap (butt weld)' },
  { value: 'socket-cap', label: 'Socket-weld cap' },
];

/** A fresh end component of the chosen type. */
export function endFromChoice(choice: EndChoice): EndSpec {
  switch (choice) {
    case 'weld-neck-flange':
    case 'slip-on-flange':
      return { type: choice };
    case 'bevel':
      return { type: 'bevel' };
    case 'plain':
      return { type: 'plain' };
    case 'cap':
      return { type: 'cap' };
    case 'socket-cap':
      return { type: 'socket-cap' };
  }
}
