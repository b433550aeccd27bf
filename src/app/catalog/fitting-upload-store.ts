import { HttpEvent } from '@angular/common/http';
import { computed, inject, Injectable } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { catchError, filter, map, Observable, of, startWith, Subject, switchMap } from 'rxjs';
import { fittingsImported, type CatalogEntry } from '../../../shared/api/catalog-contract';
import { ApiProblem, describeError } from '../core/api-problem';
import { uploadStep } from '../jobs/upload-progress';
import { CatalogStore } from './catalog-store';

export type UploadState =
  | { step: 'idle' }
  /** `percent` is null while the server reads and checks the file. */
  | { step: 'uploading'; fileName: string; percent: number | null }
  | { step: 'done'; fittings: CatalogEntry[] }
  | { step: 'failed'; fileName: string; message: string; details: readonly string[] };

const idle: UploadState = { step: 'idle' };

/** One catalog file upload at a time: picking another file or cancelling drops the one under way. */
@Injectable()
export class FittingUploadStore {
  private readonly catalog = inject(CatalogStore);
  private readonly files = new Subject<File | null>();

  readonly state = toSignal(this.files.pipe(switchMap((file) => (file === null ? of(idle) : this.upload(file)))), { initialValue: idle });
  readonly busy = computed(() => this.state().step === 'uploading');

  uploadFile(file: File): void {
    this.files.next(file);
  }

  cancel(): void {
    this.files.next(null);
  }

  private upload(file: File): Observable<UploadState> {
    const fileName = file.name;
    return this.catalog.uploadFile(file).pipe(
      map((event) => this.progressOf(event, fileName)),
      filter((state): state is UploadState => state !== null),
      startWith<UploadState>({ step: 'uploading', fileName, percent: 0 }),
      catchError((error: unknown) =>
        of<UploadState>({ step: 'failed', fileName, message: uploadFailure(error), details: error instanceof ApiProblem ? error.details : [] }),
      ),
    );
  }

  private progressOf(event: HttpEvent<unknown>, fileName: string): UploadState | null {
    const step = uploadStep(event);
    if (step === null) return null;
    if ('percent' in step) return { step: 'uploading', fileName, percent: step.percent };
    this.catalog.reload();
    return { step: 'done', fittings: fittingsImported.parse(step.body).fittings };
  }
}

function uploadFailure(error: unknown): string {
  if (error instanceof ApiProblem && error.code === 'invalid-fitting')
    return 'The file is not a valid fitting or catalog file; nothing was imported. Each line below names the place in the file and the problem.';
  if (error instanceof ApiProblem && error.code === 'fitting-id-taken' && error.details.length > 1)
    return 'Some of its fitting ids are already in the catalog; nothing was imported. Each line below names one.';
  return describeError(error);
}
