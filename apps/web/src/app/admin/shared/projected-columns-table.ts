import { AfterContentInit, contentChildren, Directive, viewChild } from '@angular/core';
import { MatColumnDef, MatTable } from '@angular/material/table';

/**
 * Base of a component that wraps a `mat-table` and lets its user add columns: the `matColumnDef`s projected into
 * the component are declared in the user's template, outside the table, so they are handed to it here, as in
 * Angular Material's wrapped-table example. The component lists the projected names in its row definitions.
 */
@Directive()
export abstract class ProjectedColumnsTable implements AfterContentInit {
  private readonly table = viewChild.required(MatTable);
  private readonly columnDefs = contentChildren(MatColumnDef);

  ngAfterContentInit(): void {
    for (const columnDef of this.columnDefs()) {
      this.table().addColumnDef(columnDef);
    }
  }
}
