import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { BagClub, Build, ChosenBuildsView } from '@/server/schemas';
import { ApiError, errorMessage } from '../api-client';
import { buildName, groupBuildsByClub } from '../builds/build-summary';
import { useConfirmChosenBuildsMutation, useSetChosenBuildsMutation } from '../queries/chosen-builds';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceField } from '../ui/choice-field';
import { Notice } from '../ui/notice';
import { SelectField } from '../ui/select-field';
import { SwitchField } from '../ui/switch-field';
import { bagClubLabel, bodyOf, changeText, defaultPlacement, draftOf, versionsOf, type ChoiceDraft } from './chosen-builds-words';

type ChooseBuildsFormProps = { fittingId: string; builds: readonly Build[]; bag: readonly BagClub[]; saved: ChosenBuildsView };

/** The fitter marks a build per club and clubs to take out; Ovalyard proposes the bag changes; the fitter confirms. */
export function ChooseBuildsForm({ fittingId, builds, bag, saved }: ChooseBuildsFormProps) {
  const [draft, setDraft] = useState<ChoiceDraft>(() => draftOf(saved));
  const [dirty, setDirty] = useState(false);
  const [newStatus, setNewStatus] = useState<'on-order' | 'in-bag'>('on-order');
  const propose = useSetChosenBuildsMutation(fittingId);
  const confirm = useConfirmChosenBuildsMutation(fittingId);
  const active = bag.filter((c) => c.status !== 'out');
  const labels = Object.fromEntries(active.map((c) => [c.id, bagClubLabel(c)]));
  const placed = new Set(Object.values(draft.byClub).filter((c) => c.buildId !== '' && c.placement !== 'add').map((c) => c.placement));
  const change = (next: ChoiceDraft) => {
    setDraft(next);
    setDirty(true);
  };
  const setBuild = (club: string, buildId: string) =>
    change({ ...draft, byClub: { ...draft.byClub, [club]: { buildId, placement: draft.byClub[club]?.placement ?? defaultPlacement(club, bag) } } });
  const setPlacement = (club: string, placement: string) => change({ ...draft, byClub: { ...draft.byClub, [club]: { ...draft.byClub[club], placement } } });
  const toggleOut = (id: string, out: boolean) => change({ ...draft, takeOut: out ? [...draft.takeOut, id] : draft.takeOut.filter((x) => x !== id) });
  const conflict = confirm.error instanceof ApiError && (confirm.error.code === 'VERSION_CONFLICT' || confirm.error.code === 'PROPOSAL_STALE');
  const proposal = dirty ? [] : saved.proposal;

  return (
    <View style={styles.form}>
      {groupBuildsByClub(builds).map((group) => {
        const chosen = draft.byClub[group.club];
        return (
          <Card key={group.club}>
            <SelectField
              label={`Chosen build, ${group.clubLabel.toLowerCase()}`}
              value={chosen?.buildId ?? ''}
              options={[{ value: '', label: 'None chosen' }, ...group.builds.map((b) => ({ value: b.id, label: buildName(b.label) }))]}
              onChange={(v) => setBuild(group.club, v)}
            />
            {chosen?.buildId ? (
              <SelectField
                label="In the bag it"
                value={chosen.placement}
                options={[
                  ...active.filter((c) => !draft.takeOut.includes(c.id)).map((c) => ({ value: c.id, label: `replaces the ${labels[c.id].toLowerCase()}` })),
                  { value: 'add', label: 'goes in beside the others' },
                ]}
                onChange={(v) => setPlacement(group.club, v)}
              />
            ) : null}
          </Card>
        );
      })}
      {active.length > 0 ? (
        <Card>
          <AppText variant="label" tone="muted">Take out of the bag</AppText>
          {active
            .filter((c) => !placed.has(c.id))
            .map((c) => (
              <SwitchField key={c.id} label={labels[c.id]} value={draft.takeOut.includes(c.id)} onChange={(v) => toggleOut(c.id, v)} />
            ))}
        </Card>
      ) : null}
      {propose.error ? <Notice tone="danger">{errorMessage(propose.error)}</Notice> : null}
      {saved.problem && !dirty ? <Notice tone="caution">{`${saved.problem} Choose again.`}</Notice> : null}
      <Button
        title={dirty || saved.proposal.length === 0 ? 'Propose the bag changes' : 'Propose again'}
        variant={dirty || saved.proposal.length === 0 ? 'primary' : 'secondary'}
        busy={propose.isPending}
        onPress={() => propose.mutate(bodyOf(draft), { onSuccess: (view) => { setDraft(draftOf(view)); setDirty(false); } })}
      />
      {proposal.length > 0 ? (
        <Card>
          <AppText variant="label" tone="muted">Proposed changes to the bag</AppText>
          {proposal.map((c) => (
            <AppText key={`${c.kind}-${c.club}-${'bagClubId' in c ? c.bagClubId : c.buildId}`}>{`• ${changeText(c, labels)}`}</AppText>
          ))}
          <ChoiceField
            label="The new clubs go in as"
            value={newStatus}
            options={[{ value: 'on-order', label: 'On order' }, { value: 'in-bag', label: 'In the bag' }]}
            onChange={setNewStatus}
          />
          {confirm.error ? <Notice tone={conflict ? 'caution' : 'danger'}>{conflict ? `${errorMessage(confirm.error)} Propose again to see the bag as it is now.` : errorMessage(confirm.error)}</Notice> : null}
          <Button title="Confirm the changes" busy={confirm.isPending} onPress={() => confirm.mutate({ versions: versionsOf(proposal), newStatus })} />
        </Card>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.md } });
