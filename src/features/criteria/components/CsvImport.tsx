import { CSV_COLUMNS } from '@shared/checks/criteria-csv';
import type { CriteriaSave, CriteriaSet } from '@shared/schemas/criteria';
import { useId, useState } from 'react';
import { Button } from '../../../components/ui/Button';
import { Notice } from '../../../components/ui/Notice';
import { numeric, Table, Td } from '../../../components/ui/Table';
import { TextArea } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { conflictingSet, csvProblems, useImportCriteriaCsv } from '../api/save-criteria';

const FIELD_WORDS: Record<string, string> = {
  climate_zone: 'climate_zone',
  wall_category: 'wall_category',
  criterion: 'criterion',
  value: 'value',
  unit: 'unit',
  note: 'note',
  row: 'whole row',
  file: 'whole file',
};

/**
 * Replaces the rows of the table from CSV, all or nothing: a file with any problem is refused and every
 * problem is listed with its line; nothing is written.
 */
export function CsvImport({ set, onSaved }: { set: CriteriaSet; onSaved: (saved: CriteriaSave) => void }) {
  const [text, setText] = useState('');
  const [fileName, setFileName] = useState<string | null>(null);
  const importCsv = useImportCriteriaCsv();
  const problems = importCsv.isError ? csvProblems(importCsv.error) : null;
  const conflict = importCsv.isError ? conflictingSet(importCsv.error) : null;
  const id = useId();

  async function submit() {
    try {
      const saved = await importCsv.mutateAsync({ setId: set.id, revision: set.revision, csv: text });
      setText('');
      setFileName(null);
      onSaved(saved);
    } catch {
      // Shown below from the mutation's error.
    }
  }

  return (
    <div className="flex flex-col gap-4">
      <p className="max-w-prose text-sm">
        Columns: <code className="num break-all">{CSV_COLUMNS.join(',')}</code>. Zones are ASHRAE 169
        designations or <code className="num">*</code> for all zones; the unit column says whether a value is
        SI or IP (e.g. <code className="num">W/(m²·K)</code> or <code className="num">Btu/(h·ft²·°F)</code>).
        The import replaces every row
        {set.frozenAt ? ` and, as this version is frozen, becomes version ${set.version + 1}` : ''}.
      </p>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-file`} className="text-sm font-semibold">
          CSV file
        </label>
        <input
          id={`${id}-file`}
          type="file"
          accept=".csv,text/csv"
          className="text-sm"
          onChange={async (e) => {
            const file = e.target.files?.[0];
            if (!file) return;
            setFileName(file.name);
            setText(await file.text());
          }}
        />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-text`} className="text-sm font-semibold">
          Or paste the CSV text{fileName ? ` (from ${fileName})` : ''}
        </label>
        <TextArea
          id={`${id}-text`}
          className="num min-h-32 text-sm"
          value={text}
          spellCheck={false}
          onChange={(e) => setText(e.target.value)}
        />
      </div>
      <div>
        <Button
          variant="secondary"
          busy={importCsv.isPending}
          busyLabel="Importing…"
          disabled={text.trim() === ''}
          onClick={submit}
        >
          Import and replace every row
        </Button>
      </div>
      {problems ? (
        <Notice
          tone="caution"
          title={`Not imported: ${problems.length} problem${problems.length === 1 ? '' : 's'}. Nothing was changed.`}
          live
        >
          <Table caption="Problems in the CSV, by line" head={[numeric('Line'), 'Column', 'Problem']}>
            <tbody>
              {problems.map((p, i) => (
                // biome-ignore lint/suspicious/noArrayIndexKey: problems are listed once, in order
                <tr key={i}>
                  <Td numeric>{p.line}</Td>
                  <Td className="num">{FIELD_WORDS[p.field] ?? p.field}</Td>
                  <Td>{p.reason.charAt(0).toUpperCase() + p.reason.slice(1)}</Td>
                </tr>
              ))}
            </tbody>
          </Table>
        </Notice>
      ) : conflict ? (
        <Notice
          tone="warning"
          title="Not imported: the table changed since you opened it. Reload it and import again."
          live
        />
      ) : importCsv.isError ? (
        <Notice tone="caution" title={errorMessage(importCsv.error)} live />
      ) : null}
    </div>
  );
}
