import { formatDateTime } from '@tiermode/shared-types';
import {
  Alert,
  Box,
  Button,
  LinearProgress,
  Link,
  Stack,
  Tab,
  Tabs,
  Typography,
} from '@mui/material';
import type { CalculationDto, UserDto } from '@tiermode/shared-types';
import { AxiosError } from 'axios';
import { useState } from 'react';
import { Link as RouterLink, useNavigate, useParams, useSearchParams } from 'react-router';
import { RequestFailed } from '@/components/errors/request-failed';
import { CautionBanner } from '@/components/feedback/caution-banner';
import { LeaveGuard } from '@/components/feedback/leave-guard';
import { StatusChip } from '@/components/feedback/status-chip';
import { AnalysisSettings } from '@/features/analysis/components/analysis-settings';
import { Section } from '@/components/layouts/section';
import { AnalysisResults } from '@/features/analysis/components/results/analysis-results';
import { SpectrumEditor } from '@/features/analysis/components/spectrum-editor';
import { StoreyTable } from '@/features/analysis/components/storey-table';
import { UnitsToggle } from '@/features/analysis/components/units-toggle';
import { useAnalysisInputs } from '@/features/analysis/model/use-analysis-inputs';
import { useMe } from '@/features/auth/api/get-me';
import { BasisForm } from '@/features/checks/components/basis-form';
import { ChecksResults } from '@/features/checks/components/checks-results';
import {
  useCalculation,
  useSaveAndAnalyse,
  storedModalDetail,
  useSaveCalculation,
} from '@/features/calculations/api/calculations';
import { AttachmentsPanel } from '@/features/calculations/components/attachments-panel';
import { ChangesPanel } from '@/features/calculations/components/changes-panel';
import { CommentThread } from '@/features/calculations/components/comment-thread';
import { DeleteDraftButton } from '@/features/calculations/components/delete-draft-button';
import { DownloadsMenu } from '@/features/calculations/components/downloads-menu';
import { HistoryPanel } from '@/features/calculations/components/history-panel';
import { ResponseHistoryTab } from '@/features/response-history/components/response-history-tab';
import { PreliminaryWatermark } from '@/features/calculations/components/preliminary-watermark';
import { ReviewActions } from '@/features/calculations/components/review-actions';
import { SealPanel } from '@/features/calculations/components/seal-panel';
import { canOn, useAppAbility } from '@/lib/ability';
import { errorMessages } from '@/lib/api-client';
import '@/lib/charts';
import { sameJson } from '@/lib/same-json';
import type { UnitSystem } from '@/lib/units';

const TABS = [
  'Storey table',
  'Design spectrum',
  'Results',
  'Checks',
  'Response history',
  'Review',
  'Audit trail',
] as const;
type TabName = (typeof TABS)[number];

/** Each tab's name in the address (`?tab=results`), so Back returns to the tab before. */
const TAB_SLUGS: Record<TabName, string> = {
  'Storey table': 'storeys',
  'Design spectrum': 'spectrum',
  Results: 'results',
  Checks: 'checks',
  'Response history': 'response-history',
  Review: 'review',
  'Audit trail': 'audit',
};
const tabOf = (slug: string | null): TabName =>
  // `history` was the audit trail's slug before the response history had a tab.
  slug === 'history'
    ? 'Audit trail'
    : (TABS.find((name) => TAB_SLUGS[name] === slug) ?? 'Storey table');

/** A saved calculation: its inputs, stored results, review and history, in tabs. */
export function CalculationRoute() {
  const { id = '' } = useParams();
  const calc = useCalculation(id);
  const me = useMe(true);
  if (calc.isError) return <RequestFailed error={calc.error} />;
  if (!calc.data || !me.data) return <LinearProgress aria-label="Loading the calculation" />;
  return <CalculationWorkspace key={calc.data.id} calc={calc.data} user={me.data.user} />;
}

function CalculationWorkspace({ calc, user }: { calc: CalculationDto; user: UserDto }) {
  const ability = useAppAbility();
  const navigate = useNavigate();
  const inputs = useAnalysisInputs(calc.inputs);
  const [units, setUnits] = useState<UnitSystem>(calc.displayUnits);
  const [searchParams, setSearchParams] = useSearchParams();
  const tab = tabOf(searchParams.get('tab'));
  const setTab = (name: TabName) =>
    setSearchParams((params) => {
      const next = new URLSearchParams(params);
      next.set('tab', TAB_SLUGS[name]);
      return next;
    });
  const save = useSaveCalculation(calc.id);
  // The response history tab's record and settings, not kept yet.
  const [historyDirty, setHistoryDirty] = useState(false);
  const [historyVisited, setHistoryVisited] = useState(false);
  if (tab === 'Response history' && !historyVisited) setHistoryVisited(true);
  const analyse = useSaveAndAnalyse(calc.id);

  const record = {
    id: calc.id,
    status: calc.status,
    authorId: calc.author.id,
    projectMemberIds: calc.projectMemberIds,
  };
  const editable = calc.status === 'draft' && canOn(ability, 'update', 'Calculation', record);
  const ofRecord = calc.status === 'locked' || calc.status === 'superseded';
  // A draft that never went to review may be thrown away by its author.
  const deletable = calc.submittedAt === null && canOn(ability, 'delete', 'Calculation', record);
  // Switching units is a way of looking, not an edit: it never marks the calc unsaved. The
  // units shown are saved with the calc's next save, by whoever may edit it.
  // Edits that cannot be saved yet (a marked cell: request null) count as unsaved too.
  const dirty = editable && !sameJson(inputs.request, calc.inputs);
  const saveError = save.error ?? analyse.error;
  const conflict = saveError instanceof AxiosError && saveError.response?.status === 409;
  const busy = save.isPending || analyse.isPending;

  const doSave = () =>
    inputs.request &&
    save.mutate({ version: calc.version, inputs: inputs.request, displayUnits: units });
  const doAnalyse = () =>
    analyse.mutate(
      {
        version: calc.version,
        ...(dirty && inputs.request ? { inputs: inputs.request, displayUnits: units } : {}),
      },
      // From the inputs, on to the results; from the checks (or any later tab), stay there.
      {
        onSuccess: () => {
          if (tab === 'Storey table' || tab === 'Design spectrum') setTab('Results');
        },
      },
    );

  const result = calc.analysis;
  const openComments = calc.comments.filter((c) => c.parentId === null && !c.resolved);
  // Open comments tied to a storey, marked on that storey's row.
  const storeyComments = new Map<number, string[]>();
  for (const c of openComments) {
    if (c.storey !== null) {
      storeyComments.set(c.storey, [
        ...(storeyComments.get(c.storey) ?? []),
        `${c.author.name}: ${c.body}`,
      ]);
    }
  }
  const resultsMatchStoreys =
    result !== null && result.modes[0]?.shape.length === calc.inputs.storeys.length;

  return (
    <Stack spacing={2}>
      <LeaveGuard when={(dirty || historyDirty) && !busy} what="edits to this calc" />
      <Stack
        direction="row"
        sx={{ alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap', gap: 1 }}
      >
        <Stack spacing={0.5}>
          <Typography variant="h1">{calc.title}</Typography>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center', flexWrap: 'wrap' }}>
            <StatusChip
              status={calc.status}
              size="medium"
              returnedWithComments={calc.returnedAt ? openComments.length : null}
            />
            <Typography color="text.secondary">
              Revision {calc.revision} ·{' '}
              {ability.can('read', 'Project') ? (
                <Link component={RouterLink} to={`/projects/${calc.projectId}`}>
                  {calc.projectName}
                </Link>
              ) : (
                calc.projectName
              )}{' '}
              · by {calc.author.name}
              {calc.reviewer ? ` · reviewed by ${calc.reviewer.name}` : ''}
            </Typography>
          </Stack>
        </Stack>
        <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
          <DownloadsMenu calc={calc} units={units} />
          <UnitsToggle units={units} onChange={setUnits} />
        </Stack>
      </Stack>
      <CautionBanner />
      {!ofRecord && (
        <Alert severity="info" role="note" aria-label="Preliminary">
          Preliminary: {calc.status === 'draft' ? 'a draft' : 'under review'}, not a calc of record.
          Nothing here is for construction until a licensed reviewer locks it.
        </Alert>
      )}
      {calc.status === 'superseded' && (
        <Alert severity="warning">
          Superseded: a newer revision of this calc has been locked. See the audit trail.
        </Alert>
      )}
      {calc.seal && <SealPanel calc={calc} />}

      {editable && (
        <Stack
          direction="row"
          spacing={1}
          sx={{ alignItems: 'center', flexWrap: 'wrap' }}
          aria-label="Saving"
        >
          <Button variant="outlined" disabled={!dirty || !inputs.request || busy} onClick={doSave}>
            Save
          </Button>
          <Button variant="contained" disabled={!inputs.request || busy} onClick={doAnalyse}>
            {dirty ? 'Save and analyse' : 'Analyse'}
          </Button>
          <Typography role="status" color={dirty ? 'warning.main' : 'text.secondary'}>
            {busy
              ? 'Saving…'
              : dirty
                ? inputs.request
                  ? 'Unsaved changes'
                  : 'Unsaved changes; fix the marked inputs to save them'
                : 'All changes saved'}
          </Typography>
          {deletable && (
            <DeleteDraftButton
              calc={calc}
              onDeleted={() => void navigate(`/projects/${calc.projectId}`)}
            />
          )}
        </Stack>
      )}
      {busy && <LinearProgress aria-label="Working" />}
      {saveError && (
        <Alert
          severity="error"
          role="alert"
          action={
            conflict ? (
              <Button color="inherit" onClick={() => inputs.reset(calc.inputs)}>
                Load the saved calc
              </Button>
            ) : undefined
          }
        >
          {conflict
            ? 'Someone else saved this calc after you opened it; their change is kept. Load the saved calc (your edits here are then lost), or copy your values first.'
            : errorMessages(saveError).join(' ')}
        </Alert>
      )}

      <Tabs
        value={tab}
        onChange={(_, value: TabName) => setTab(value)}
        variant="scrollable"
        aria-label="Calculation sections"
      >
        {TABS.map((name) => (
          <Tab key={name} value={name} label={name} />
        ))}
      </Tabs>

      <PreliminaryWatermark show={!ofRecord}>
        {tab === 'Storey table' && (
          <Section title="Storey table">
            <StoreyTable
              rows={inputs.rows}
              units={units}
              onChange={inputs.setRows}
              readOnly={!editable}
              flags={resultsMatchStoreys && !dirty ? result.plausibility : undefined}
              comments={storeyComments}
            />
            <AnalysisSettings inputs={inputs} readOnly={!editable} />
          </Section>
        )}
        {tab === 'Design spectrum' && (
          <Section title="Design spectrum">
            <SpectrumEditor
              spectrum={inputs.spectrum}
              modes={result?.modes ?? []}
              onChange={inputs.setSpectrum}
              readOnly={!editable}
            />
          </Section>
        )}
        {tab === 'Results' && (
          <Stack spacing={2}>
            {result === null && (
              <Alert severity="info">
                Not analysed yet.{editable ? ' Analyse to see the modes and responses.' : ''}
              </Alert>
            )}
            {result && calc.analysisStale && (
              <Alert severity="warning" role="alert">
                These results are older than the saved inputs (analysed{' '}
                {formatDateTime(calc.analysedAt, '')}, inputs changed{' '}
                {formatDateTime(calc.inputsChangedAt)}). Analyse again before relying on them.
              </Alert>
            )}
            {dirty && (
              <Alert severity="info">
                You have unsaved changes; these results are for the saved inputs.
              </Alert>
            )}
            {result && resultsMatchStoreys && (
              <>
                <Typography color="text.secondary">
                  Engine {calc.engineVersion}
                  {calc.analysedAt ? `, ${formatDateTime(calc.analysedAt)}` : ''}.
                </Typography>
                <AnalysisResults
                  result={result}
                  detail={storedModalDetail(calc.id, calc.analysedAt)}
                  storeys={calc.inputs.storeys}
                  units={units}
                />
              </>
            )}
          </Stack>
        )}
        {tab === 'Checks' && (
          <Stack spacing={2}>
            <Section title="Code basis">
              <BasisForm
                basis={calc.basis}
                defaultCode="ASCE7-22"
                storeys={calc.inputs.storeys.length}
                spectrumSource={inputs.spectrum.source}
                units={units}
                readOnly={!editable}
                saving={save.isPending}
                onSave={(basis) => save.mutate({ version: calc.version, basis })}
              />
            </Section>
            {calc.basis === null && (
              <Alert severity="info">Set a code basis to check this calc against it.</Alert>
            )}
            {calc.basis !== null && (calc.checks === null || calc.analysisStale) && (
              <Alert severity="warning" role="alert">
                The checks are older than the inputs or the basis, or not made yet: analyse to
                update them.
              </Alert>
            )}
            {calc.checks && calc.analysis && !calc.analysisStale && (
              <Section title="Checks">
                <ChecksResults
                  checks={calc.checks}
                  analysis={calc.analysis}
                  storeys={calc.inputs.storeys}
                  units={units}
                />
              </Section>
            )}
          </Stack>
        )}
        {tab === 'Review' && (
          <Section title="Review">
            <Stack spacing={3}>
              <ReviewActions
                calc={calc}
                user={user}
                dirty={dirty}
                onRevised={(draft) => void navigate(`/calculations/${draft.id}`)}
              />
              <CommentThread calc={calc} />
            </Stack>
          </Section>
        )}
        {tab === 'Review' && (
          <Section title="What changed">
            <ChangesPanel calc={calc} units={units} />
          </Section>
        )}
        {tab === 'Review' && (
          <Section title="Attachments">
            <AttachmentsPanel
              calc={calc}
              editable={editable}
              removable={editable && calc.author.id === user.id}
            />
          </Section>
        )}
        {/* Mounted on the first visit and kept (hidden) after, so its unsaved setup survives a
            look at another tab. */}
        {historyVisited && (
          <Box sx={{ display: tab === 'Response history' ? 'block' : 'none' }}>
            <ResponseHistoryTab
              calc={calc}
              units={units}
              editable={editable}
              saving={save.isPending}
              onSave={(history) => save.mutate({ version: calc.version, history })}
              onDirtyChange={setHistoryDirty}
            />
          </Box>
        )}
        {tab === 'Audit trail' && (
          <Section title="Audit trail">
            <HistoryPanel calc={calc} />
          </Section>
        )}
      </PreliminaryWatermark>
    </Stack>
  );
}
