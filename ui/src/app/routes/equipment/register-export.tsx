import { Button } from '@mantine/core';
import { IconFileSpreadsheet } from '@tabler/icons-react';
import { saveBlob } from '../../../lib/api-client';
import { csvBlob, toCsv } from '../../../lib/csv';
import { useRegister } from '../../../features/register/api/get-register';

/** The register as a spreadsheet: one row per brake position, with its sheets. */
export function RegisterExport() {
  const register = useRegister();
  const data = register.data;
  const exportCsv = () => {
    if (!data) return;
    const rows: (string | number)[][] = [
      [
        'Site code',
        'Site',
        'Machine tag',
        'Machine',
        'Kind',
        'Position tag',
        'Position',
        'Motion',
        'Brake',
        'Thruster or magnet',
        'Lining',
        'Approved sheets in force',
        'Open sheets',
      ],
    ];
    for (const s of data.sites)
      for (const m of s.machines) {
        const positions = m.positions.length ? m.positions : [null];
        for (const p of positions)
          rows.push([
            s.code,
            s.name,
            m.tag,
            m.name,
            m.kind,
            p?.tag ?? '',
            p?.description ?? '',
            p?.motion ?? '',
            p?.brakeKind ?? '',
            p?.thruster ?? '',
            p?.lining ?? '',
            (p?.inForce ?? []).map((f) => `${f.documentNumber} rev. ${f.revisionLabel}`).join('; '),
            (p?.openSheets ?? [])
              .map((o) => `${o.documentNumber} rev. ${o.revisionLabel} (${o.state})`)
              .join('; '),
          ]);
      }
    saveBlob(
      csvBlob(toCsv(rows)),
      `holdfast-register-${new Date().toISOString().slice(0, 10)}.csv`,
    );
  };
  return (
    <Button
      variant="default"
      leftSection={<IconFileSpreadsheet size={16} aria-hidden />}
      onClick={exportCsv}
      disabled={!data}
    >
      Export CSV
    </Button>
  );
}
