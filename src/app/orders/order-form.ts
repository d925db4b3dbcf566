import { ChangeDetectionStrategy, Component, DestroyRef, OnInit, computed, inject, input, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { HttpErrorResponse } from '@angular/common/http';
import { Router, RouterLink } from '@angular/router';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { catchError, debounceTime, distinctUntilChanged, firstValueFrom, map, of, startWith, switchMap } from 'rxjs';
import { MatAutocompleteModule } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { provideNativeDateAdapter } from '@angular/material/core';
import { MatDatepickerModule } from '@angular/material/datepicker';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import type { Customer, OrderCreate, OrderDetail } from '../../shared/intake-contract';
import { apiErrorSentence } from '../core/api-error';
import { OrdersApi } from './orders-api';

/** The fields that can carry a sentence of their own. */
type Field = 'customer' | 'name' | 'contactName' | 'email' | 'phone' | 'dueDate' | 'dueTime' | 'notes';

// Where the hub's `details[].path` points, as a field of this form.
const SERVER_PATHS: Readonly<Record<string, Field>> = {
  customerId: 'customer',
  'newCustomer.name': 'name',
  'newCustomer.contactName': 'contactName',
  'newCustomer.email': 'email',
  'newCustomer.phone': 'phone',
  dueAt: 'dueDate',
  notes: 'notes',
};

/** The shop's usual collection time for a new order when the lead does not pick one. */
const DEFAULT_DUE_TIME = '15:00';

/** New order or edit order: the customer (found or made here), the due time and notes. */
@Component({
  selector: 'dw-order-form',
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatAutocompleteModule,
    MatButtonModule,
    MatButtonToggleModule,
    MatDatepickerModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
  ],
  providers: [provideNativeDateAdapter()],
  templateUrl: './order-form.html',
  styleUrl: './order-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OrderForm implements OnInit {
  private readonly api = inject(OrdersApi);
  private readonly router = inject(Router);
  private readonly destroyRef = inject(DestroyRef);

  /** The order's id from the route when editing; absent for a new order. */
  readonly id = input<string>();
  protected readonly editing = computed(() => this.id() !== undefined);

  protected readonly form = new FormGroup({
    customerMode: new FormControl<'existing' | 'new'>('existing', { nonNullable: true }),
    customer: new FormControl<Customer | string | null>(null),
    newCustomer: new FormGroup({
      name: new FormControl('', { nonNullable: true }),
      contactName: new FormControl('', { nonNullable: true }),
      email: new FormControl('', { nonNullable: true, validators: [Validators.email] }),
      phone: new FormControl('', { nonNullable: true }),
    }),
    dueDate: new FormControl<Date | null>(null),
    dueTime: new FormControl(DEFAULT_DUE_TIME, { nonNullable: true }),
    notes: new FormControl('', { nonNullable: true }),
  });

  protected readonly customerMode = toSignal(this.form.controls.customerMode.valueChanges, { initialValue: 'existing' as const });
  protected readonly customerOptions = toSignal(
    this.form.controls.customer.valueChanges.pipe(
      map((value) => (typeof value === 'string' ? value.trim() : '')),
      debounceTime(250),
      distinctUntilChanged(),
      switchMap((q) => (q.length === 0 ? of([]) : this.api.customers(q).pipe(catchError(() => of<Customer[]>([]))))),
      startWith<Customer[]>([]),
    ),
    { initialValue: [] },
  );
  protected readonly typedCustomer = toSignal(
    this.form.controls.customer.valueChanges.pipe(map((value) => (typeof value === 'string' ? value.trim() : ''))),
    { initialValue: '' },
  );

  protected readonly errors = signal<Partial<Record<Field, string>>>({});
  protected readonly problem = signal<string | null>(null);
  protected readonly saving = signal(false);
  protected readonly loadedOrder = signal<OrderDetail | null>(null);

  constructor() {
    const fields: [Field, FormControl<unknown>][] = [
      ['customer', this.form.controls.customer],
      ['name', this.form.controls.newCustomer.controls.name],
      ['contactName', this.form.controls.newCustomer.controls.contactName],
      ['email', this.form.controls.newCustomer.controls.email],
      ['phone', this.form.controls.newCustomer.controls.phone],
      ['dueDate', this.form.controls.dueDate],
      ['dueTime', this.form.controls.dueTime],
      ['notes', this.form.controls.notes],
    ];
    for (const [field, control] of fields) {
      control.valueChanges.pipe(takeUntilDestroyed(this.destroyRef)).subscribe(() => this.clearError(field));
    }
  }

  async ngOnInit(): Promise<void> {
    const id = this.id();
    if (id === undefined) return;
    try {
      const order = await firstValueFrom(this.api.order(Number(id)));
      this.loadedOrder.set(order);
      const due = new Date(order.dueAt);
      this.form.patchValue({
        customer: order.customer,
        dueDate: due,
        dueTime: `${String(due.getHours()).padStart(2, '0')}:${String(due.getMinutes()).padStart(2, '0')}`,
        notes: order.notes,
      });
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The order could not be loaded. Try again.'));
    }
  }

  protected readonly customerName = (value: Customer | string | null): string =>
    typeof value === 'string' ? value : (value?.name ?? '');

  protected makeNewCustomer(): void {
    const typed = this.typedCustomer();
    this.form.controls.customerMode.setValue('new');
    if (typed && !this.form.controls.newCustomer.controls.name.value) {
      this.form.controls.newCustomer.controls.name.setValue(typed);
    }
  }

  protected async save(): Promise<void> {
    this.problem.set(null);
    const clientErrors = this.clientErrors();
    this.errors.set(clientErrors);
    if (Object.keys(clientErrors).length > 0) return;

    const value = this.form.getRawValue();
    const dueAt = combineDateAndTime(value.dueDate!, value.dueTime).toISOString();
    this.saving.set(true);
    try {
      const id = this.id();
      let saved: OrderDetail;
      if (id !== undefined) {
        const customer = value.customer as Customer;
        saved = await firstValueFrom(
          this.api.updateOrder(Number(id), { customerId: customer.id, dueAt, notes: value.notes.trim() }),
        );
      } else {
        const order: OrderCreate = { dueAt, notes: value.notes.trim() };
        if (value.customerMode === 'new') {
          const c = value.newCustomer;
          order.newCustomer = { name: c.name.trim(), contactName: c.contactName.trim(), email: c.email.trim(), phone: c.phone.trim() };
        } else {
          order.customerId = (value.customer as Customer).id;
        }
        saved = await firstValueFrom(this.api.createOrder(order));
      }
      await this.router.navigate(['/orders', saved.id]);
    } catch (error) {
      this.showServerErrors(error);
    } finally {
      this.saving.set(false);
    }
  }

  private clientErrors(): Partial<Record<Field, string>> {
    const value = this.form.getRawValue();
    const errors: Partial<Record<Field, string>> = {};
    if (value.customerMode === 'new' && !this.editing()) {
      if (!value.newCustomer.name.trim()) errors.name = 'Enter the customer’s name.';
      if (this.form.controls.newCustomer.controls.email.invalid) errors.email = 'Enter an e-mail address like name@example.com, or leave it empty.';
    } else if (value.customer === null || typeof value.customer === 'string') {
      errors.customer = 'Pick a customer from the list, or tap “New customer”.';
    }
    if (value.dueDate === null) {
      errors.dueDate = 'Pick the date the order is due.';
    } else if (Number.isNaN(value.dueDate.getTime())) {
      errors.dueDate = 'That date is not a date. Pick one from the calendar.';
    }
    if (!/^\d{2}:\d{2}$/.test(value.dueTime)) errors.dueTime = 'Enter the time it is due, like 15:00.';
    return errors;
  }

  private showServerErrors(error: unknown): void {
    const mapped: Partial<Record<Field, string>> = {};
    const unplaced: string[] = [];
    const details = error instanceof HttpErrorResponse ? (error.error as { details?: unknown } | null)?.details : undefined;
    if (Array.isArray(details)) {
      for (const detail of details as { path?: unknown; message?: unknown }[]) {
        const path = Array.isArray(detail.path) ? detail.path.join('.') : String(detail.path ?? '');
        const field = SERVER_PATHS[path];
        const message = typeof detail.message === 'string' ? detail.message : '';
        if (field && message) mapped[field] = message;
        else if (message) unplaced.push(message);
      }
    }
    this.errors.set(mapped);
    if (Object.keys(mapped).length === 0 || unplaced.length > 0) {
      this.problem.set(apiErrorSentence(error, 'The order could not be saved. Try again.'));
    }
  }

  private clearError(field: Field): void {
    if (this.errors()[field] === undefined) return;
    this.errors.update(({ [field]: _cleared, ...rest }) => rest);
  }
}

/** The local date and "HH:mm" time as one instant. */
function combineDateAndTime(date: Date, time: string): Date {
  const [hours, minutes] = time.split(':').map(Number);
  return new Date(date.getFullYear(), date.getMonth(), date.getDate(), hours, minutes);
}
