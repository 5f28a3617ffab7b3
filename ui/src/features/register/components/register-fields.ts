import { machineKinds, motions } from '@holdfast/shared';
import type { RegisterField } from './register-form-dialog';

const words = (v: string) => v.replace('-', ' ');

export const siteAddFields: RegisterField[] = [
  {
    name: 'code',
    label: 'Site code',
    description: '2 to 6 capital letters or digits; it starts every document number.',
    required: true,
  },
  { name: 'name', label: 'Site name', required: true },
];

/** The code is in every document number issued, so only the name can change. */
export const siteEditFields: RegisterField[] = [siteAddFields[1]!];

export const machineFields: RegisterField[] = [
  { name: 'tag', label: 'Tag', placeholder: 'e.g. CR-12', required: true },
  { name: 'name', label: 'Name', placeholder: 'e.g. Ladle crane 2', required: true },
  {
    name: 'kind',
    label: 'Kind of machine',
    required: true,
    options: machineKinds.map((k) => ({ value: k, label: words(k) })),
  },
];

export const positionFields: RegisterField[] = [
  { name: 'tag', label: 'Position tag', placeholder: 'e.g. MH-B1', required: true },
  {
    name: 'description',
    label: 'Description',
    placeholder: 'e.g. Main hoist, motor-side brake',
    required: true,
  },
  {
    name: 'motion',
    label: 'Motion',
    required: true,
    options: motions.map((m) => ({ value: m, label: words(m) })),
  },
  {
    name: 'brakeKind',
    label: 'Brake',
    description: 'As the plant calls it, e.g. “two-shoe drum brake, 400 mm drum”.',
  },
  {
    name: 'thruster',
    label: 'Thruster or magnet',
    description: 'e.g. “electro-hydraulic thruster, 800 N, 60 mm stroke”.',
  },
  { name: 'lining', label: 'Lining', description: 'e.g. “woven lining, bonded, 8 mm”.' },
];
