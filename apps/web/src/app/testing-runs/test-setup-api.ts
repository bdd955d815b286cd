import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { Article, ArticleInput, Balance, Organisation, Test, TestInput, Tunnel } from '@tunnelwright/contracts';
import { Observable, map } from 'rxjs';

/** Staff calls for opening and editing tests and keeping the customers' test articles. */
@Injectable({ providedIn: 'root' })
export class TestSetupApi {
  private readonly http = inject(HttpClient);

  /** Customer organisations by name (the lab itself cannot be a test's customer). */
  customers(): Observable<Organisation[]> {
    return this.http.get<Organisation[]>('/api/organisations').pipe(map((all) => all.filter((organisation) => organisation.kind === 'customer')));
  }

  /** Test articles by name; only one organisation's when given. */
  articles(organisationId?: string): Observable<Article[]> {
    return this.http.get<Article[]>('/api/articles', { params: organisationId ? { organisationId } : {} });
  }

  createArticle(input: ArticleInput): Observable<Article> {
    return this.http.post<Article>('/api/articles', input);
  }

  updateArticle(id: string, input: ArticleInput): Observable<Article> {
    return this.http.put<Article>(`/api/articles/${id}`, input);
  }

  /** Removes an article no test uses; the API answers 409 when one does. */
  deleteArticle(id: string): Observable<void> {
    return this.http.delete<void>(`/api/articles/${id}`);
  }

  /** Tunnels in service. */
  tunnels(): Observable<Tunnel[]> {
    return this.http.get<Tunnel[]>('/api/tunnels');
  }

  balances(): Observable<Balance[]> {
    return this.http.get<Balance[]>('/api/balances');
  }

  test(id: string): Observable<Test> {
    return this.http.get<Test>(`/api/tests/${id}`);
  }

  createTest(input: TestInput): Observable<Test> {
    return this.http.post<Test>('/api/tests', input);
  }

  updateTest(id: string, input: TestInput): Observable<Test> {
    return this.http.put<Test>(`/api/tests/${id}`, input);
  }
}
