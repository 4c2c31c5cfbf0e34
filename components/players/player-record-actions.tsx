import { Linking, Platform } from 'react-native';
import type { Player } from '@/server/schemas';
import { useArchivePlayerMutation, useDeletePlayerMutation } from '../queries/archive';
import { playerExportUrl } from '../queries/shop';
import { ArchiveDeleteActions } from '../ui/archive-delete-actions';
import { Button } from '../ui/button';

type PlayerRecordActionsProps = { player: Player; staff: boolean; onDeleted: () => void };

/** Everything held about the player as a zip (the player and staff); archive and delete (staff). */
export function PlayerRecordActions({ player, staff, onDeleted }: PlayerRecordActionsProps) {
  const archive = useArchivePlayerMutation(player.id);
  const remove = useDeletePlayerMutation(player.id);
  const download = () => {
    const url = playerExportUrl(player.id);
    if (Platform.OS === 'web') window.location.assign(url);
    else void Linking.openURL(url);
  };
  return (
    <>
      <Button title={staff ? 'Download everything held about them' : 'Download everything held about you'} variant="secondary" compact onPress={download} />
      {staff ? (
        <ArchiveDeleteActions
          what={player.name}
          archived={player.archived}
          onArchive={(a) => archive.mutate(a)}
          archiveBusy={archive.isPending}
          archiveError={archive.error}
          deleteQuestion={`Delete ${player.name}? Their ${player.fittingCount ?? 0} fitting(s), shots, bag, spec sheets and sign-in go too. This cannot be undone.`}
          onDelete={() => remove.mutate(undefined, { onSuccess: onDeleted })}
          deleteBusy={remove.isPending}
          deleteError={remove.error}
        />
      ) : null}
    </>
  );
}
