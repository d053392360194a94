import { useMemo, useState } from 'react';
import type { VehicleDetail } from '@photon-ledger/shared';
import { Button } from '../../../components/ui/button';
import { ApiRequestError } from '../../../lib/api-client';
import { useCreateVehicle } from '../api/create-vehicle';
import { useCreateVehicleRevision } from '../api/create-vehicle-revision';
import { useUploadPlateSet } from '../api/upload-plate-set';
import type { SunAngles } from '../lib/srp-preview';
import { draftFromSpec, emptyDraft } from '../lib/vehicle-draft';
import { VehicleEditor, type VehicleEditorProps } from './vehicle-editor';

/** What the mesh kind needs from the route: the mission's meshes and the view of a chosen mesh. */
export type MeshSupport = Pick<VehicleEditorProps, 'meshChoices' | 'renderMeshPreview'>;

/** Where the Sun starts: lighting three faces of a box at once. */
export const DEFAULT_SUN: SunAngles = { azimuthDeg: 35, elevationDeg: 25 };

/** Props of NewVehicleEditor. */
export interface NewVehicleEditorProps {
  missionId: string;
  /** Called with the new vehicle's id once it is created (by saving or by importing a CSV). */
  onCreated: (vehicleId: string) => void;
  mesh?: MeshSupport;
}

/** The editor on an empty vehicle; "Create vehicle" makes its revision 1. */
export function NewVehicleEditor({ missionId, onCreated, mesh }: NewVehicleEditorProps) {
  const [initialDraft] = useState(emptyDraft);
  const [sun, setSun] = useState(DEFAULT_SUN);
  const create = useCreateVehicle(missionId);
  const upload = useUploadPlateSet(missionId);
  return (
    <VehicleEditor
      initialDraft={initialDraft}
      isNew
      readOnly={false}
      {...mesh}
      sun={sun}
      onSunChange={setSun}
      saving={create.isPending}
      saveError={create.error}
      onSave={({ spec, note }) =>
        create.mutate(
          { name: spec.name, spec, ...(note ? { note } : {}) },
          { onSuccess: (saved) => onCreated(saved.vehicle.id) },
        )
      }
      onImport={(file, fields) => {
        if (!fields) return;
        upload.mutate({ file, target: { target: 'new', ...fields } }, { onSuccess: (result) => onCreated(result.vehicle.id) });
      }}
      importPending={upload.isPending}
      importError={upload.error}
    />
  );
}

/** Props of ExistingVehicleEditor. */
export interface ExistingVehicleEditorProps {
  missionId: string;
  /** The vehicle as last fetched. */
  vehicle: VehicleDetail;
  /** Reviewers and admins see it read-only. */
  readOnly: boolean;
  /** Fetches the vehicle again and answers the fresh copy (after a conflict). */
  onReload: () => Promise<VehicleDetail | undefined>;
  mesh?: MeshSupport;
}

/**
 * The editor on a vehicle's latest revision; "Save revision" makes the next one. The revision the
 * edit started from is kept here and moves only when the user saves, imports or reloads, so a
 * background refetch never throws edits away: it shows that a newer revision exists instead.
 */
export function ExistingVehicleEditor({ missionId, vehicle, readOnly, onReload, mesh }: ExistingVehicleEditorProps) {
  const [base, setBase] = useState({ revision: vehicle.revision, spec: vehicle.latestSpec });
  const [sun, setSun] = useState(DEFAULT_SUN);
  const [notice, setNotice] = useState<string | null>(null);
  const [reloading, setReloading] = useState(false);
  const save = useCreateVehicleRevision(missionId, vehicle.id);
  const upload = useUploadPlateSet(missionId);
  // Reviewers follow the latest revision; editors stay on theirs.
  const shown = readOnly ? { revision: vehicle.revision, spec: vehicle.latestSpec } : base;
  const initialDraft = useMemo(() => draftFromSpec(shown.spec), [shown.spec]);

  const stale = save.error instanceof ApiRequestError && save.error.status === 409 && save.error.fields?.basedOnRevision !== undefined;
  const newer = vehicle.revision > base.revision;

  async function reload() {
    setReloading(true);
    try {
      const fresh = await onReload();
      if (fresh) {
        setBase({ revision: fresh.revision, spec: fresh.latestSpec });
        setNotice(`Showing revision ${fresh.revision}, the latest.`);
        save.reset();
        upload.reset();
      }
    } finally {
      setReloading(false);
    }
  }

  const banner =
    stale || newer ? (
      <div role="alert" className="mb-3 flex flex-wrap items-center gap-3 rounded-md border border-sodium/50 bg-sodium-wash px-3 py-2 text-sm">
        <p className="flex-1">
          {newer
            ? `Revision ${vehicle.revision} was saved by someone else since revision ${base.revision} that you are editing.`
            : 'Someone saved a newer revision while you were editing, so this one was not saved.'}{' '}
          Reload the latest to continue from it (your unsaved changes here will be lost), or compare the revisions in the history first.
        </p>
        <Button size="sm" onClick={() => void reload()} disabled={reloading}>
          {reloading ? 'Reloading…' : 'Reload latest revision'}
        </Button>
      </div>
    ) : notice ? (
      <p role="status" className="mb-3 rounded-md bg-sage-wash px-3 py-2 text-sm text-sage-deep">
        {notice}
      </p>
    ) : null;

  return (
    <VehicleEditor
      key={shown.revision}
      initialDraft={initialDraft}
      isNew={false}
      readOnly={readOnly}
      {...mesh}
      sun={sun}
      onSunChange={setSun}
      saving={save.isPending}
      saveError={save.error}
      banner={banner}
      onSave={({ spec, note }) =>
        save.mutate(
          { spec, basedOnRevision: base.revision, ...(note ? { note } : {}) },
          {
            onSuccess: (saved) => {
              setBase({ revision: saved.revision.revision, spec: saved.revision.spec });
              setNotice(`Saved revision ${saved.revision.revision}.`);
            },
          },
        )
      }
      onImport={(file) =>
        upload.mutate(
          { file, target: { target: 'existing', vehicleId: vehicle.id, basedOnRevision: base.revision } },
          {
            onSuccess: (result) => {
              setBase({ revision: result.revision.revision, spec: result.revision.spec });
              setNotice(
                `Revision ${result.revision.revision} made from ${result.upload.fileName} (${result.revision.surfaceCount} plates).`,
              );
            },
          },
        )
      }
      importPending={upload.isPending}
      importError={upload.error}
      importNotice={null}
    />
  );
}
