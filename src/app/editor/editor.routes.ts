import { Routes } from '@angular/router';
import { PanelEditor } from './panel-editor';
import { unsavedChangesGuard } from './unsaved-changes-guard';

export default [{ path: '', component: PanelEditor, canDeactivate: [unsavedChangesGuard], title: 'Panel editor · Borewright' }] satisfies Routes;
