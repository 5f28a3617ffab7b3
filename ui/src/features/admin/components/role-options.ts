import { roles } from '@holdfast/shared';
import { roleLabel } from '../../../components/role-badge';

export const roleOptions = roles.map((role) => ({ value: role, label: roleLabel[role] }));
