import type { BookingArticle, BookingState, TestPlan } from '@tunnelwright/contracts';
import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { BookingAttachment } from './booking-attachment';
import { Organisation } from './organisation';
import { Quote } from './quote';
import { Service } from './service';
import { Tunnel } from './tunnel';
import { User } from './user';

/**
 * A customer's booking of tunnel time. `period` and `counterPeriod` are PostgreSQL `tstzrange` values
 * ('[)') as text; read them with `parsePeriod` from the booking periods helper.
 */
export class Booking extends BaseModel {
  static override tableName = 'bookings';

  organisationId!: string;
  tunnelId!: string;
  serviceId!: string | null;
  requestedBy!: string;
  period!: string;
  state!: BookingState;
  holdExpiresAt!: Date | null;
  technicianId!: string | null;
  testPlan!: TestPlan;
  articles!: BookingArticle[];
  customerNote!: string;
  declineReason!: string | null;
  counterPeriod!: string | null;
  counterNote!: string | null;
  cancelledAt!: Date | null;
  cancelledBy!: string | null;
  cancellationReason!: string | null;
  cancellationFeeMinor!: number | null;
  icsUid!: string;
  icsSequence!: number;
  testId!: string | null;

  /** cancellationFeeMinor: bigint columns, which pg hands over as strings; amounts stay far below 2^53. */
  override $parseDatabaseJson(json: Record<string, unknown>): Record<string, unknown> {
    const parsed = super.$parseDatabaseJson(json);
    for (const key of ['cancellationFeeMinor']) if (typeof parsed[key] === 'string') parsed[key] = Number(parsed[key]);
    return parsed;
  }

  organisation?: Organisation;
  tunnel?: Tunnel;
  service?: Service | null;
  requester?: User;
  technician?: User | null;
  quotes?: Quote[];
  attachments?: BookingAttachment[];

  static override get jsonAttributes(): string[] {
    return ['testPlan', 'articles'];
  }

  static override relationMappings = (): RelationMappings => ({
    organisation: { relation: Model.BelongsToOneRelation, modelClass: Organisation, join: { from: 'bookings.organisationId', to: 'organisations.id' } },
    tunnel: { relation: Model.BelongsToOneRelation, modelClass: Tunnel, join: { from: 'bookings.tunnelId', to: 'tunnels.id' } },
    service: { relation: Model.BelongsToOneRelation, modelClass: Service, join: { from: 'bookings.serviceId', to: 'services.id' } },
    requester: { relation: Model.BelongsToOneRelation, modelClass: User, join: { from: 'bookings.requestedBy', to: 'users.id' } },
    technician: { relation: Model.BelongsToOneRelation, modelClass: User, join: { from: 'bookings.technicianId', to: 'users.id' } },
    quotes: { relation: Model.HasManyRelation, modelClass: Quote, join: { from: 'bookings.id', to: 'quotes.bookingId' } },
    attachments: { relation: Model.HasManyRelation, modelClass: BookingAttachment, join: { from: 'bookings.id', to: 'booking_attachments.bookingId' } },
  });
}
