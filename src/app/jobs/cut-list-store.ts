import { computed, inject, Injectable } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { catchError, filter, map, Observable, of, startWith, Subject, switchMap } from 'rxjs';
import { cutListImported, CutListImported, cutListPreview, CutListPreview } from '../../../shared/api/cut-list-contract';
import { ApiProblem, describeError } from '../core/api-problem';
import { CutListApi } from './cut-list-api';
import { uploadStep } from './upload-progress';

export type CutListState =
  | { step: 'idle' }
  /** Sending the file to be read; `percent` is null while the server reads it. */
  | { step: 'reading'; fileName: string; percent: number | null }
  | { step: 'preview'; file: File; preview: CutListPreview }
  | { step: 'importing'; file: File; preview: CutListPreview; percent: number | null }
  | { step: 'done'; fileName: string; imported: CutListImported }
  | { step: 'failed'; fileName: string; message: string; details: readonly string[] };

const idle: CutListState = { step: 'idle' };

/**
 * A cut list on its way in: the file is read by the server into a preview (nothing written), then, on
 * confirmation, the same file is imported. Choosing another file or closing drops the request under way.
 */
@Injectable()
export class CutListStore {
  private readonly api = inject(CutListApi);
  private readonly runs = new Subject<Observable<CutListState>>();
  private jobId = 0;

  readonly state = toSignal(this.runs.pipe(switchMap((run) => run)), { initialValue: idle });
  readonly busy = computed(() => ['reading', 'importing'].includes(this.state().step));
  /** The preview on screen, also while it is being imported. */
  readonly preview = computed(() => {
    const state = this.state();
    return state.step === 'preview' || state.step === 'importing' ? state.preview : null;
  });
  /** Only a preview without a single error may be imported: a bad row never half-imports. */
  readonly canImport = computed(() => {
    const state = this.state();
    return state.step === 'preview' && state.preview.problems.length === 0 && state.preview.rowsWithErrors === 0 && state.preview.rows.length > 0;
  });

  forJob(jobId: number): void {
    this.jobId = jobId;
  }

  readFile(file: File): void {
    this.runs.next(
      this.upload(this.api.preview(this.jobId, file), file.name, (percent) => ({ step: 'reading', fileName: file.name, percent }), (body) => ({
        step: 'preview',
        file,
        preview: cutListPreview.parse(body),
      })),
    );
  }

  confirm(): void {
    const state = this.state();
    if (state.step !== 'preview' || !this.canImport()) return;
    const { file, preview } = state;
    this.runs.next(
      this.upload(this.api.import(this.jobId, file), file.name, (percent) => ({ step: 'importing', file, preview, percent }), (body) => ({
        step: 'done',
        fileName: file.name,
        imported: cutListImported.parse(body),
      })),
    );
  }

  cancel(): void {
    this.runs.next(of(idle));
  }

  private upload(
    events: Observable<Parameters<typeof uploadStep>[0]>,
    fileName: string,
    sending: (percent: number | null) => CutListState,
    answered: (body: unknown) => CutListState,
  ): Observable<CutListState> {
    return events.pipe(
      map(uploadStep),
      filter((step) => step !== null),
      map((step) => ('body' in step ? answered(step.body) : sending(step.percent))),
      startWith(sending(0)),
      catchError((error: unknown) =>
        of<CutListState>({ step: 'failed', fileName, message: describeError(error), details: error instanceof ApiProblem ? error.details : [] }),
      ),
    );
  }
}
