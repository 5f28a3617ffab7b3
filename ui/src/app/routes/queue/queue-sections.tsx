import { Anchor, List, Paper, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import type { Role, WorkQueue } from '@holdfast/shared';

export interface QueueSectionSpec {
  id: string;
  title: string;
  empty: string;
  list: keyof WorkQueue;
}

const returned: QueueSectionSpec = {
  id: 'returned',
  title: 'Returned to me',
  empty: 'Nothing returned to you.',
  list: 'returnedToMe',
};
const check: QueueSectionSpec = {
  id: 'check',
  title: 'Waiting for my check',
  empty: 'No revision is waiting for your check.',
  list: 'awaitingMyCheck',
};
const drafts: QueueSectionSpec = {
  id: 'drafts',
  title: 'My drafts',
  empty: 'You have no drafts open.',
  list: 'myDrafts',
};
const approvedMine: QueueSectionSpec = {
  id: 'approved',
  title: 'Recently approved',
  empty: 'Nothing of yours approved lately.',
  list: 'recentlyApproved',
};
const approvedToFile: QueueSectionSpec = {
  id: 'approved',
  title: 'Newly approved: print into the safety file',
  empty: 'No sheet approved lately.',
  list: 'recentlyApproved',
};
const approvedToSet: QueueSectionSpec = {
  id: 'approved',
  title: 'Newly approved: brakes to set',
  empty: 'No sheet approved lately.',
  list: 'recentlyApproved',
};

/**
 * The sections each role acts on, most urgent first. A viewer neither authors nor checks, so
 * shows only approvals to file, and a fitter the approvals to set brakes to (every approval, as
 * the server sends them); an administrator manages people and criteria, not sheets.
 */
export function queueSections(role: Role): QueueSectionSpec[] {
  switch (role) {
    case 'checker':
      return [check, returned, drafts, approvedMine];
    case 'engineer':
      return [returned, drafts, approvedMine];
    case 'viewer':
      return [approvedToFile];
    case 'technician':
      return [approvedToSet];
    case 'admin':
      return [];
  }
}

export const roleLine: Record<Role, string> = {
  checker: 'Checks by others come first, then your own work.',
  engineer: 'Your sheets that need you.',
  viewer: 'Approved sheets to read, print and file, and field records to countersign.',
  admin: 'People and acceptance criteria are yours to keep.',
  technician: 'Approved sheets and their field cards for the brakes you set.',
};

/** The administrator's work is not in sheets: point at the screens where it is done. */
export function AdminQueue() {
  return (
    <Paper p="md" component="section" aria-labelledby="admin-work" data-queue="admin">
      <Title order={2} size="h5" id="admin-work" mb="sm">
        Administration
      </Title>
      <List size="sm" spacing={4}>
        <List.Item>
          {/* Worded unlike the navigation's "Users" and "Criteria sets", which stay unique. */}
          <Anchor component={Link} to="/admin/users">
            People, roles and sign-ins
          </Anchor>
        </List.Item>
        <List.Item>
          <Anchor component={Link} to="/criteria">
            Acceptance criteria and their versions
          </Anchor>
        </List.Item>
      </List>
      <Text size="xs" mt="sm">
        Sheets are authored by engineers and checked by checkers.
      </Text>
    </Paper>
  );
}
