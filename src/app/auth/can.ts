import { Directive, effect, inject, input, TemplateRef, ViewContainerRef } from '@angular/core';
import type { Permission } from '../../../shared/api/roles';
import { AuthStore } from './auth-store';

/**
 * Shows its element only to roles that hold the permission (roles.ts `permissions`), so nobody
 * sees a control they may not use: `<button *bwCan="'editJobs'">`.
 */
@Directive({ selector: '[bwCan]' })
export class Can {
  private readonly auth = inject(AuthStore);
  private readonly template = inject(TemplateRef<unknown>);
  private readonly container = inject(ViewContainerRef);

  readonly bwCan = input.required<Permission>();

  constructor() {
    effect(() => {
      const allowed = this.auth.can(this.bwCan());
      if (allowed && this.container.length === 0) this.container.createEmbeddedView(this.template);
      if (!allowed) this.container.clear();
    });
  }
}
