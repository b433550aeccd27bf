import { HttpClient } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { can, Permission, User, sessionAnswer, userAnswer } from '../../../shared/api/contract';
import { ApiProblem } from '../core/api-problem';
import { forgetCachedAnswers } from '../core/offline-cache';

/** Who is signed in, and what their role lets them do (contract.ts `permissions`). */
@Injectable({ providedIn: 'root' })
export class AuthStore {
  private readonly http = inject(HttpClient);

  /** `undefined` until the server has been asked; `null` when nobody is signed in. */
  private readonly current = signal<User | null | undefined>(undefined);
  private restoring: Promise<User | null> | undefined;

  readonly user = computed(() => this.current() ?? null);
  readonly role = computed(() => this.current()?.role);
  readonly signedIn = computed(() => this.user() !== null);

  can(permission: Permission): boolean {
    return can(this.role(), permission);
  }

  /**
   * Asks the server once who is signed in. The same call hands out the XSRF cookie that every later
   * change needs, so the app makes it at start.
   */
  restoreSession(): Promise<User | null> {
    this.restoring ??= firstValueFrom(this.http.get('/api/auth/session'))
      .then((raw) => sessionAnswer.parse(raw).user)
      .then(
        (who) => this.remember(who),
        () => this.remember(null),
      );
    return this.restoring;
  }

  /** Rejects with an ApiProblem: 401 for wrong credentials, 429 after too many tries. */
  async signIn(email: string, password: string): Promise<User> {
    // The sign-in POST needs the XSRF token of the current session; asking who is signed in hands it out.
    await this.restoreSession();
    const raw = await firstValueFrom(this.http.post('/api/auth/sign-in', { email, password }));
    const { user: who } = userAnswer.parse(raw);
    // What the offline worker kept was read by whoever used this device before.
    await forgetCachedAnswers();
    this.remember(who);
    return who;
  }

  /**
   * Forgets the user once the server has ended the session (or says there was none), so a sign-out
   * that never reached the server is not mistaken for one.
   */
  async signOut(): Promise<void> {
    try {
      await firstValueFrom(this.http.post('/api/auth/sign-out', null));
    } catch (error) {
      if (!(error instanceof ApiProblem && error.status === 401)) throw error;
    }
    await this.forgetSession();
  }

  /** A session the server started itself, by accepting an invitation: the app is signed in as its user. */
  adoptSession(who: User): void {
    void forgetCachedAnswers();
    this.remember(who);
  }

  /**
   * Called when the session has ended. The next restoreSession() asks the server again, which also
   * hands out the token the new session's first change needs. The answers the offline worker kept for
   * this member are emptied (resolved when done), so the next one on this device never reads them.
   */
  forgetSession(): Promise<void> {
    this.current.set(null);
    this.restoring = undefined;
    return forgetCachedAnswers();
  }

  private remember(who: User | null): User | null {
    this.current.set(who);
    this.restoring = Promise.resolve(who);
    return who;
  }
}
