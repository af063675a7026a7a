import { useRef, useState } from 'react';
import type { Finding } from '../../../shared/schemas/findings';
import { useCreateFinding } from '../../features/findings/api/create-finding';
import { useDeleteFinding } from '../../features/findings/api/delete-finding';
import { useUpdateFinding } from '../../features/findings/api/update-finding';
import type { NewMark } from '../../lib/new-mark';
import type { NewFindingValues } from '../../features/markup/lib/new-finding';
import type { Command } from '../../features/markup/model/commands';

type Pending = { readonly mark: NewMark; readonly resolve: (id: number | undefined) => void };

/**
 * What the photo markup page does with the canvas's callbacks: the create flow (a new mark waits for its words,
 * then becomes a finding and is selected), moves and deletes through the findings API with their errors shown,
 * and bringing a deleted finding back when it is undone.
 */
export function usePhotoMarkupActions({
  photoId,
  restorationId,
  onCreated,
  onDeleted,
}: {
  photoId: number;
  restorationId: number;
  onCreated: (finding: Finding) => void;
  onDeleted: (id: number) => void;
}) {
  const create = useCreateFinding(photoId, restorationId);
  const update = useUpdateFinding(photoId, restorationId);
  const remove = useDeleteFinding(photoId, restorationId);
  const [pending, setPending] = useState<Pending>();
  const pendingRef = useRef<Pending | undefined>(undefined);
  const [alert, setAlert] = useState<string>();

  const setPendingMark = (next: Pending | undefined) => {
    pendingRef.current?.resolve(undefined);
    pendingRef.current = next;
    setPending(next);
  };

  return {
    pending: pending?.mark,
    alert,
    dismissAlert: () => setAlert(undefined),
    createError: create.error?.message,
    creating: create.isPending,
    /** The canvas made a mark: ask for its words; resolves with the finding's id once it exists. */
    startCreate: (mark: NewMark) =>
      new Promise<number | undefined>((resolve) => {
        create.reset();
        setPendingMark({ mark, resolve });
      }),
    cancelCreate: () => setPendingMark(undefined),
    submitCreate: (values: NewFindingValues) => {
      const current = pendingRef.current;
      if (!current) return;
      create.mutate(
        { ...values, shape: current.mark.shape, points: current.mark.points },
        {
          onSuccess: (finding) => {
            current.resolve(finding.id);
            if (pendingRef.current === current) {
              pendingRef.current = undefined;
              setPending(undefined);
            }
            onCreated(finding);
          },
        },
      );
    },
    move: (id: number, points: { x: number; y: number }[]) =>
      update.mutate(
        { id, patch: { points } },
        { onError: (error) => setAlert(`The finding was not moved: ${error.message}`) },
      ),
    delete: (id: number) => {
      onDeleted(id);
      remove.mutate(id, { onError: (error) => setAlert(`The finding was not deleted: ${error.message}`) });
    },
    /** Undoing a delete: the mark and its words come back as a new finding (its thread does not). */
    undo: async (command: Command): Promise<number | undefined> => {
      if (command.type !== 'create' || !command.fields) return undefined;
      const {
        title = 'Restored finding',
        componentRef,
        kind,
        severity,
        ownerVisible,
        status,
        dismissReason,
      } = command.fields;
      try {
        const finding = await create.mutateAsync({
          title,
          componentRef,
          kind,
          severity,
          ownerVisible,
          shape: command.shape,
          points: command.points.map((p) => ({ x: p.x, y: p.y })),
        });
        if (status && status !== 'observed')
          update.mutate({
            id: finding.id,
            patch: { status, ...(status === 'dismissed' ? { dismissReason: dismissReason ?? '' } : {}) },
          });
        return finding.id;
      } catch (error) {
        setAlert(`The finding was not brought back: ${error instanceof Error ? error.message : 'unknown error'}`);
        return undefined;
      }
    },
  };
}
