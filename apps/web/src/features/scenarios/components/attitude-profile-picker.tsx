import { useRef } from 'react';
import type { Upload } from '@photon-ledger/shared';
import { Button } from '../../../components/ui/button';
import { useAttitudeProfiles } from '../api/list-attitude-profiles';
import { useUploadAttitudeProfile } from '../api/upload-attitude-profile';
import { SelectField } from './form-fields';

/** Props of AttitudeProfilePicker. */
export interface AttitudeProfilePickerProps {
  missionId: string;
  fieldKey: string;
  /** The chosen upload's id ('' for none). */
  value: string;
  onChange: (profileId: string) => void;
  outside: 'refuse' | 'clamp';
  onOutsideChange: (outside: 'refuse' | 'clamp') => void;
  error?: string | undefined;
  /** Reviewers: no upload button. */
  readOnly: boolean;
}

/** An attitude profile upload as a choice: file name, rows and the time it covers. */
export function describeProfile(upload: Upload): string {
  if (upload.kind !== 'attitude-profile') return upload.fileName;
  const { rowCount, startSeconds, endSeconds } = upload.summary;
  const hours = (endSeconds - startSeconds) / 3600;
  return `${upload.fileName} — ${rowCount} rows over ${Number(hours.toPrecision(3))} h`;
}

/** Chooses an uploaded attitude profile for a tabulated law, or uploads a new CSV and chooses it. */
export function AttitudeProfilePicker({ missionId, fieldKey, value, onChange, outside, onOutsideChange, error, readOnly }: AttitudeProfilePickerProps) {
  const profiles = useAttitudeProfiles(missionId);
  const upload = useUploadAttitudeProfile(missionId);
  const fileInput = useRef<HTMLInputElement>(null);
  const uploads = profiles.data?.uploads ?? [];
  const options = uploads.map((u) => ({ value: u.id, label: describeProfile(u) }));
  if (value && !uploads.some((u) => u.id === value)) options.push({ value, label: `Upload ${value.slice(0, 8)}…` });
  const placeholder = profiles.isPending
    ? 'Loading profiles…'
    : profiles.isError
      ? 'Profiles could not be loaded'
      : uploads.length === 0
        ? 'No profiles uploaded yet'
        : 'Choose a profile…';

  return (
    <div className="grid gap-4 md:grid-cols-[2fr_1fr]">
      <div className="flex flex-col gap-2">
        <SelectField
          fieldKey={fieldKey}
          label="Attitude profile"
          value={value}
          placeholder={placeholder}
          options={options}
          onChange={onChange}
          error={error}
          hint="Quaternions over time (CSV: time_utc or t_s, q_w, q_x, q_y, q_z), interpolated by slerp"
        />
        {!readOnly && (
          <div className="flex flex-wrap items-center gap-3">
            <input
              ref={fileInput}
              id={`${fieldKey}-file`}
              type="file"
              accept=".csv,text/csv"
              className="sr-only"
              aria-label="Upload attitude profile (CSV)"
              onChange={(event) => {
                const file = event.target.files?.[0];
                event.target.value = '';
                if (file) upload.mutate(file, { onSuccess: (result) => onChange(result.upload.id) });
              }}
            />
            <Button size="sm" onClick={() => fileInput.current?.click()} disabled={upload.isPending} aria-busy={upload.isPending || undefined}>
              {upload.isPending ? 'Uploading…' : 'Upload a profile (CSV)…'}
            </Button>
            <p role="status" className="text-xs text-ink-soft">
              {upload.isSuccess ? `Uploaded ${upload.data.upload.fileName}.` : ''}
            </p>
          </div>
        )}
        {upload.isError && (
          <p role="alert" className="text-xs font-medium text-alarm">
            The profile was not stored: {upload.error.message}
          </p>
        )}
      </div>
      <SelectField
        fieldKey="spec.attitude.outside"
        label="Outside the table"
        value={outside}
        options={[
          { value: 'refuse', label: 'Refuse (stop the run)' },
          { value: 'clamp', label: 'Hold the first or last attitude' },
        ]}
        onChange={(v) => onOutsideChange(v as 'refuse' | 'clamp')}
      />
    </div>
  );
}
