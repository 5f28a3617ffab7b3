import { useState } from 'react';
import {
  Alert,
  Button,
  Center,
  Group,
  Input,
  Loader,
  Paper,
  Stack,
  Text,
  TextInput,
  Title,
} from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck, IconCircleX } from '@tabler/icons-react';
import { useNavigate, useParams } from 'react-router-dom';
import { verificationCodeSchema } from '@holdfast/shared';
import { Wordmark } from '../../../components/brand/wordmark';
import { SafetyCaution } from '../../../components/safety-caution';
import { isApiRequestError, errorMessage } from '../../../lib/api-client';
import type { RouteHandle } from '../../../lib/route-handle';
import { useVerification } from '../../../features/verify/api/get-verification';
import { stateLabel } from '../../../lib/state-label';
import { isoDay } from '../../../lib/dates';
import { sentence } from '../../../lib/sentence';

export const handle: RouteHandle = { title: 'Check a printout' };

function Result({ code }: { code: string }) {
  const q = useVerification(code);
  if (q.isPending)
    return (
      <Center h={120}>
        <Loader size="sm" />
      </Center>
    );
  if (q.isError) {
    const notFound = isApiRequestError(q.error) && q.error.status === 404;
    return (
      <Alert
        color="fail"
        icon={<IconCircleX size={20} />}
        title={notFound ? 'Unknown code' : 'Could not check'}
        role="alert"
      >
        {notFound
          ? `No Holdfast sheet carries the code ${code}. Do not use this printout until it is confirmed.`
          : errorMessage(q.error)}
      </Alert>
    );
  }
  const r = q.data;
  const ok = r.current && r.state === 'approved';
  return (
    <Alert
      color={ok ? (r.underReview ? 'amber' : 'pass') : 'fail'}
      variant={ok ? 'light' : 'filled'}
      icon={ok ? <IconCircleCheck size={22} /> : <IconAlertTriangle size={22} />}
      title={
        ok
          ? 'Current: this is the approved revision in force'
          : 'Not current: do not use this printout'
      }
      data-verified={ok}
    >
      <Stack gap={4}>
        <Text size="sm" ff="monospace">
          {r.documentNumber} rev. {r.revisionLabel}
        </Text>
        <Text size="sm">{r.title}</Text>
        <Text size="sm">
          State: {stateLabel(r.state)}
          {r.approvedAt ? `, approved ${isoDay(r.approvedAt)}` : ''}
        </Text>
        {r.underReview ? (
          <Text size="sm" fw={600} data-under-review>
            {`approved; under review since ${isoDay(r.underReview.since)}: criteria ${r.underReview.criteriaSetName} v${r.underReview.criteriaSetVersion}`}
          </Text>
        ) : null}
        {r.newerApproved ? (
          <Text size="sm" fw={600}>
            Revision {r.newerApproved.revisionLabel} replaced it on{' '}
            {isoDay(r.newerApproved.approvedAt)}.
          </Text>
        ) : null}
      </Stack>
    </Alert>
  );
}

/** Public: anyone holding a printout enters (or scans) its code to see whether it is still in force. */
export function Component() {
  const { code: raw = '' } = useParams();
  const navigate = useNavigate();
  const [text, setText] = useState(raw);
  const parsed = verificationCodeSchema.safeParse(raw);
  const [error, setError] = useState<string | null>(null);
  const submit = () => {
    const p = verificationCodeSchema.safeParse(text);
    if (!p.success) return setError(sentence(p.error.issues[0]?.message ?? 'not a code'));
    setError(null);
    navigate(`/verify/${p.data}`);
  };
  return (
    <Center mih="100vh" p="md" bg="gray.0">
      <Paper p="xl" w={520} maw="100%">
        <Stack gap="md">
          <Wordmark />
          <Title order={1} size="h3">
            Check a printout
          </Title>
          <Text size="sm" c="dimmed">
            Every page of a Holdfast printout carries a verification code. Enter it to see whether
            that revision is still the approved one in force.
          </Text>
          {/* The label sits above the row, so the button lines up with the box, not with the
              box and its error line together. */}
          <Stack gap={4}>
            <Input.Label htmlFor="verification-code">Verification code</Input.Label>
            <Group align="flex-start" gap="xs" wrap="nowrap">
              <TextInput
                id="verification-code"
                value={text}
                onChange={(e) => setText(e.currentTarget.value.toUpperCase())}
                onKeyDown={(e) => e.key === 'Enter' && submit()}
                error={error}
                classNames={{ input: 'hf-num' }}
                style={{ flex: 1 }}
                maxLength={12}
              />
              <Button onClick={submit}>Check</Button>
            </Group>
          </Stack>
          {raw && parsed.success ? <Result code={parsed.data} /> : null}
          {raw && !parsed.success ? (
            <Alert color="fail">{sentence(parsed.error.issues[0]?.message ?? 'not a code')}</Alert>
          ) : null}
          <SafetyCaution />
        </Stack>
      </Paper>
    </Center>
  );
}
