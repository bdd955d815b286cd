import { HttpClient, HttpEventType, type HttpEvent, type HttpResponse } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { Booking, BookingAttachment, BookingRequest, BookingSettings, CancellationPreview, MaintenanceBlock, Occupancy, PeriodInput, QuoteInput } from '@tunnelwright/contracts';
import { Observable, filter, map } from 'rxjs';

/** How far one attachment upload has come: a share of the bytes sent, then the stored attachments. */
export type AttachmentUploadEvent = { readonly kind: 'progress'; readonly fraction: number } | { readonly kind: 'done'; readonly attachments: BookingAttachment[] };

/** The lab's booking rules together with its IANA zone. */
export type LabBookingSettings = BookingSettings & { readonly timeZone: string };

/** Bookings of tunnel time and their life cycle; customers only ever see their own organisation's. */
@Injectable({ providedIn: 'root' })
export class BookingApi {
  private readonly http = inject(HttpClient);

  settings(): Observable<LabBookingSettings> {
    return this.http.get<LabBookingSettings>('/api/bookings/settings');
  }

  /** Replaces the lab's booking rules (lab managers); the API records the change in the audit log. */
  saveSettings(rules: BookingSettings): Observable<LabBookingSettings> {
    return this.http.put<LabBookingSettings>('/api/bookings/settings', rules);
  }

  /** Bookings, soonest first. */
  list(): Observable<Booking[]> {
    return this.http.get<Booking[]>('/api/bookings');
  }

  request(input: BookingRequest): Observable<Booking> {
    return this.http.post<Booking>('/api/bookings', input);
  }

  quote(id: string, input: QuoteInput): Observable<Booking> {
    return this.http.post<Booking>(`/api/bookings/${id}/quote`, input);
  }

  decline(id: string, reason: string): Observable<Booking> {
    return this.http.post<Booking>(`/api/bookings/${id}/decline`, { reason });
  }

  counterPropose(id: string, period: PeriodInput, note: string): Observable<Booking> {
    return this.http.post<Booking>(`/api/bookings/${id}/counter-proposal`, { ...period, note });
  }

  /** Moves a confirmed booking (lab manager); the customer gets an updated calendar entry. */
  reschedule(id: string, period: PeriodInput, note: string): Observable<Booking> {
    return this.http.post<Booking>(`/api/bookings/${id}/reschedule`, { ...period, note });
  }

  acceptCounterProposal(id: string): Observable<Booking> {
    return this.http.post<Booking>(`/api/bookings/${id}/accept-counter-proposal`, {});
  }

  acceptQuote(id: string): Observable<Booking> {
    return this.http.post<Booking>(`/api/bookings/${id}/accept-quote`, {});
  }

  rejectQuote(id: string): Observable<Booking> {
    return this.http.post<Booking>(`/api/bookings/${id}/reject-quote`, {});
  }

  assignTechnician(id: string, technicianId: string | null): Observable<Booking> {
    return this.http.post<Booking>(`/api/bookings/${id}/technician`, { technicianId });
  }

  /** Marks a confirmed booking in test, linking the test record that holds its runs when one is given. */
  start(id: string, testId: string | null = null): Observable<Booking> {
    return this.http.post<Booking>(`/api/bookings/${id}/start`, testId ? { testId } : {});
  }

  complete(id: string): Observable<Booking> {
    return this.http.post<Booking>(`/api/bookings/${id}/complete`, {});
  }

  cancellationPreview(id: string): Observable<CancellationPreview> {
    return this.http.get<CancellationPreview>(`/api/bookings/${id}/cancellation-preview`);
  }

  cancel(id: string, reason: string, expectedFeeMinor: number): Observable<Booking> {
    return this.http.post<Booking>(`/api/bookings/${id}/cancel`, { reason, expectedFeeMinor });
  }

  /** Free and busy stretches of one tunnel; other customers' bookings carry no names. */
  occupancy(tunnelId: string, from: string, to: string): Observable<Occupancy> {
    return this.http.get<Occupancy>(`/api/tunnels/${tunnelId}/occupancy`, { params: { from, to } });
  }

  maintenanceBlocks(): Observable<MaintenanceBlock[]> {
    return this.http.get<MaintenanceBlock[]>('/api/maintenance-blocks');
  }

  createMaintenanceBlock(input: PeriodInput & { tunnelId: string; reason: string }): Observable<MaintenanceBlock> {
    return this.http.post<MaintenanceBlock>('/api/maintenance-blocks', input);
  }

  deleteMaintenanceBlock(id: string): Observable<void> {
    return this.http.delete<void>(`/api/maintenance-blocks/${id}`);
  }

  /** Sends one file to a booking, reporting the share of bytes sent. */
  attach(id: string, file: File): Observable<AttachmentUploadEvent> {
    const body = new FormData();
    body.append('files', file, file.name);
    return this.http.post<BookingAttachment[]>(`/api/bookings/${id}/attachments`, body, { reportProgress: true, observe: 'events' }).pipe(
      filter((event: HttpEvent<BookingAttachment[]>) => event.type === HttpEventType.UploadProgress || event.type === HttpEventType.Response),
      map((event): AttachmentUploadEvent => {
        if (event.type === HttpEventType.UploadProgress) {
          return { kind: 'progress', fraction: event.total ? event.loaded / event.total : 0 };
        }
        return { kind: 'done', attachments: (event as HttpResponse<BookingAttachment[]>).body ?? [] };
      }),
    );
  }

  /** One attachment's content, fetched with the signed-in session. */
  attachment(id: string, attachmentId: string): Observable<Blob> {
    return this.http.get(`/api/bookings/${id}/attachments/${attachmentId}`, { responseType: 'blob' });
  }
}
