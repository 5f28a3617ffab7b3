import { Alert, Anchor, List } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { sheetTypeTitle } from '../../../components/calc/utils/sheet-types';
import { stateLabel } from '../../../lib/state-label';
import { findPosition, useRegister } from '../api/get-register';

/**
 * Said before a second open sheet is started for a brake position: two drafts of the same brake
 * invite two answers to one question. It warns and links; it does not forbid (a disc-spring sheet
 * beside a brake sheet is normal).
 */
export function OpenSheetWarning({
  positionId,
  sheetType,
}: {
  positionId: string | null;
  sheetType: string | null;
}) {
  const register = useRegister();
  if (!positionId || !register.data) return null;
  const position = findPosition(register.data, positionId);
  const open = position?.openSheets ?? [];
  if (open.length === 0) return null;
  const sameType = open.filter((o) => o.sheetType === sheetType);
  return (
    <Alert
      color="amber"
      variant="light"
      icon={<IconAlertTriangle size={18} aria-hidden />}
      title={
        sameType.length > 0
          ? `${position!.tag} already has an open ${sheetTypeTitle(sheetType ?? '').toLowerCase()} sheet`
          : `${position!.tag} already has an open sheet`
      }
      data-testid="open-sheet-warning"
    >
      Continue that sheet, or start a new one only if it answers a different question.
      <List size="sm" mt={4}>
        {open.map((o) => (
          <List.Item key={o.sheetId}>
            <Anchor component={Link} to={`/sheets/${o.sheetId}`} size="sm">
              {o.documentNumber} rev. {o.revisionLabel}
            </Anchor>{' '}
            — {sheetTypeTitle(o.sheetType)}, {stateLabel(o.state).toLowerCase()}
          </List.Item>
        ))}
      </List>
    </Alert>
  );
}
