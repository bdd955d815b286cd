import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { Service, ServiceInput, Tunnel, TunnelInput } from '@tunnelwright/contracts';
import { Observable } from 'rxjs';

/** Tunnels and services: read by everybody signed in, written by lab managers. */
@Injectable({ providedIn: 'root' })
export class CatalogueApi {
  private readonly http = inject(HttpClient);

  /** Active tunnels; staff may ask for archived ones as well. */
  tunnels(includeArchived = false): Observable<Tunnel[]> {
    return this.http.get<Tunnel[]>('/api/tunnels', { params: includeArchived ? { includeArchived: 'true' } : {} });
  }

  createTunnel(input: TunnelInput): Observable<Tunnel> {
    return this.http.post<Tunnel>('/api/tunnels', input);
  }

  updateTunnel(id: string, input: TunnelInput): Observable<Tunnel> {
    return this.http.put<Tunnel>(`/api/tunnels/${id}`, input);
  }

  setTunnelArchived(id: string, archived: boolean): Observable<Tunnel> {
    return this.http.post<Tunnel>(`/api/tunnels/${id}/${archived ? 'archive' : 'restore'}`, null);
  }

  /** Active services; staff may ask for archived ones as well. */
  services(includeArchived = false): Observable<Service[]> {
    return this.http.get<Service[]>('/api/services', { params: includeArchived ? { includeArchived: 'true' } : {} });
  }

  createService(input: ServiceInput): Observable<Service> {
    return this.http.post<Service>('/api/services', input);
  }

  updateService(id: string, input: ServiceInput): Observable<Service> {
    return this.http.put<Service>(`/api/services/${id}`, input);
  }

  setServiceArchived(id: string, archived: boolean): Observable<Service> {
    return this.http.post<Service>(`/api/services/${id}/${archived ? 'archive' : 'restore'}`, null);
  }
}
