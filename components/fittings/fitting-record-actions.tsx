import { useRouter } from 'expo-router';
import type { Fitting } from '@/server/schemas';
import { useArchiveFittingMutation, useDeleteFittingMutation } from '../queries/archive';
import { ArchiveDeleteActions } from '../ui/archive-delete-actions';
import { Section } from '../ui/section';

type FittingRecordActionsProps = { fitting: Fitting };

/** Archive or delete the fitting (staff); after a delete, back to the player. */
export function FittingRecordActions({ fitting }: FittingRecordActionsProps) {
  const router = useRouter();
  const archive = useArchiveFittingMutation(fitting.id);
  const remove = useDeleteFittingMutation(fitting.id);
  return (
    <Section title="Archive or delete">
      <ArchiveDeleteActions
        what="this fitting"
        archived={fitting.archived}
        onArchive={(a) => archive.mutate(a)}
        archiveBusy={archive.isPending}
        archiveError={archive.error}
        deleteQuestion={`Delete this fitting? Its ${fitting.shotCount} shot(s), bay files, builds and spec sheet go too; the bag keeps its clubs. This cannot be undone.`}
        onDelete={() => remove.mutate(undefined, { onSuccess: () => router.replace({ pathname: '/players/[id]', params: { id: fitting.playerId } }) })}
        deleteBusy={remove.isPending}
        deleteError={remove.error}
      />
    </Section>
  );
}
