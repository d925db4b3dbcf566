import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { RecipeListItem, RecipeRevision, RecipeValues } from '../../shared/press/press-contract';

/** The hub's Recipe book calls. */
@Injectable({ providedIn: 'root' })
export class RecipesApi {
  private readonly http = inject(HttpClient);

  /** Every recipe with its film type and fabric names. */
  list(): Promise<RecipeListItem[]> {
    return firstValueFrom(this.http.get<RecipeListItem[]>('/api/recipes'));
  }

  /** Saves a recipe's values (°C and seconds). */
  update(id: number, values: RecipeValues): Promise<RecipeListItem> {
    return firstValueFrom(this.http.put<RecipeListItem>(`/api/recipes/${id}`, values));
  }

  /** A recipe's changes, newest first. */
  revisions(id: number): Promise<RecipeRevision[]> {
    return firstValueFrom(this.http.get<RecipeRevision[]>(`/api/recipes/${id}/revisions`));
  }
}
