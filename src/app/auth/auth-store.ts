import { HttpClient } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { can, type Permission } from '../../../shared/api/roles';
import type { User } from '../../../shared/api/session-contract';
import type { LengthUnit } from '../../../shared/units/length-unit';
import { ApiProblem } from '../core/api-problem';
import { forgetCachedAnswers } from '../core/offline-cache';

/** The answers' schemas, loaded beside the first request rather than in the first page (session-contract.ts). */
const answers = () => import('../../../shared/api/session-contract');

/** Who is signed in, and what their role lets them do (roles.ts `permissions`). */
@Injectable({ providedIn: 'root' })
export class AuthStore {
  private readonly http = inject(HttpClient);

  /** `undefined` until the server has been asked; `null` when nobody is signed in. */
  private readonly current = signal<User | null | undefined>(undefined);
  private restoring: Promise<User | null> | undefined;

  readonly user = computed(() => this.current() ?? null);
  readonly role = computed(() => this.current()?.role);
  readonly signedIn = computed(() => this.user() !== null);
  /** Whether this installation lets visitors create a shop (the server's SIGNUP), as the session answer says. */
  readonly signUpOpen = signal(false);
  /** How the signed-in user reads lengths; millimetres when nobody is signed in. */
  readonly units = computed<LengthUnit>(() => this.current()?.units ?? 'mm');

  can(permission: Permission): boolean {
    return can(this.role(), permission);
  }

  /**
   * Asks the server once who is signed in. The same call hands out the XSRF cookie that every later
   * change needs, so the app makes it at start.
   */
  restoreSession(): Promise<User | null> {
    this.restoring ??= Promise.all([firstValueFrom(this.http.get('/api/auth/session')), answers()])
      .then(([raw, { sessionAnswer }]) => {
        const answer = sessionAnswer.parse(raw);
        this.signUpOpen.set(answer.signUpOpen ?? false);
        return answer.user;
      })
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
    const [raw, { userAnswer }] = await Promise.all([firstValueFrom(this.http.post('/api/auth/sign-in', { email, password })), answers()]);
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

  /** Stores the user's own choice of units; every length on screen follows it at once. Rejects with an ApiProblem. */
  async chooseUnits(units: LengthUnit): Promise<void> {
    const [raw, { userAnswer }] = await Promise.all([firstValueFrom(this.http.patch('/api/auth/me/preferences', { units })), answers()]);
    this.remember(userAnswer.parse(raw).user);
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
