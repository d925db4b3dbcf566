import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { Person, PersonCreate, PersonUpdate } from '../../shared/people-contract';

/** Hub calls of the People screen. */
@Injectable({ providedIn: 'root' })
export class PeopleApi {
  private readonly http = inject(HttpClient);

  /** Everyone in the shop. */
  list(): Observable<Person[]> {
    return this.http.get<Person[]>('/api/people');
  }

  /** Adds a person. */
  create(person: PersonCreate): Observable<Person> {
    return this.http.post<Person>('/api/people', person);
  }

  /** Changes a person's name, e-mail, role or active state. */
  update(id: number, changes: PersonUpdate): Observable<Person> {
    return this.http.patch<Person>(`/api/people/${id}`, changes);
  }

  /** Sets an operator's PIN. */
  setPin(id: number, pin: string): Observable<Person> {
    return this.http.post<Person>(`/api/people/${id}/pin`, { pin });
  }

  /** Sets an owner's or lead's password. */
  setPassword(id: number, password: string): Observable<Person> {
    return this.http.post<Person>(`/api/people/${id}/password`, { password });
  }
}
