import { computed, inject, Injectable } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { catchError, filter, map, Observable, of, startWith, Subject, switchMap } from 'rxjs';
import { jobSummary, JobSummary } from '../../../shared/api/contract';
import { ApiProblem, describeError } from '../core/api-problem';
import { JobsApi } from './jobs-api';
import { uploadStep } from './upload-progress';

export type ImportState =
  | { step: 'idle' }
  /** `percent` is null while the server reads and checks the uploaded document. */
  | { step: 'uploading'; fileName: string; percent: number | null }
  | { step: 'done'; job: JobSummary }
  | { step: 'failed'; fileName: string; message: string; details: readonly string[] };

const idle: ImportState = { step: 'idle' };

/** One job document upload at a time: picking another file or cancelling drops the one under way. */
@Injectable()
export class JobImportStore {
  private readonly api = inject(JobsApi);

  private readonly files = new Subject<File | null>();

  readonly state = toSignal(
    this.files.pipe(switchMap((file) => (file === null ? of(idle) : this.upload(file)))),
    { initialValue: idle },
  );
  readonly busy = computed(() => this.state().step === 'uploading');

  importFile(file: File): void {
    this.files.next(file);
  }

  cancel(): void {
    this.files.next(null);
  }

  private upload(file: File): Observable<ImportState> {
    const fileName = file.name;
    return this.api.importDocument(file).pipe(
      map(uploadStep),
      filter((step) => step !== null),
      map((step): ImportState => ('body' in step ? { step: 'done', job: jobSummary.parse(step.body) } : { step: 'uploading', fileName, percent: step.percent })),
      startWith<ImportState>({ step: 'uploading', fileName, percent: 0 }),
      catchError((error: unknown) =>
        of<ImportState>({
          step: 'failed',
          fileName,
          message: importFailure(error),
          details: error instanceof ApiProblem ? error.details : [],
        }),
      ),
    );
  }
}

function importFailure(error: unknown): string {
  if (error instanceof ApiProblem && error.code === 'invalid-document')
    return 'The file is not a valid job document. Each line below names the place in the file and the problem.';
  return describeError(error);
}
