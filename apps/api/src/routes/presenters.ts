import type { AuditEntry as AuditEntryDto, InstalledBalance, Organisation as OrganisationDto, Service as ServiceDto, Tunnel as TunnelDto, UserSummary } from '@tunnelwright/contracts';
import type { AuditEntry, Organisation, Service, Tunnel, User } from '@tunnelwright/db';

/** Contract shapes of the models, so no column the client must not see leaves the API by accident. */
export function toOrganisation(org: Organisation): OrganisationDto {
  return { id: org.id, name: org.name, kind: org.kind };
}

/** `user.organisation` must be loaded. */
export function toUserSummary(user: User): UserSummary {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    organisationId: user.organisationId,
    organisationName: user.organisation?.name ?? '',
    active: user.active,
    activated: user.passwordHash !== null,
    createdAt: user.createdAt.toISOString(),
  };
}

/** A tunnel as the API shows it, with the balances installed in it (none unless given). */
export function toTunnel(tunnel: Tunnel, balances: readonly InstalledBalance[] = []): TunnelDto {
  return {
    id: tunnel.id,
    name: tunnel.name,
    kind: tunnel.kind,
    description: tunnel.description,
    width: tunnel.width,
    height: tunnel.height,
    area: tunnel.area,
    length: tunnel.length,
    minSpeed: tunnel.minSpeed,
    maxSpeed: tunnel.maxSpeed,
    pressureGradient: tunnel.pressureGradient,
    shapeFactor: tunnel.shapeFactor,
    openJetConstants: tunnel.openJetConstants,
    capabilities: tunnel.capabilities,
    balances: [...balances],
    archived: tunnel.archivedAt !== null,
    createdAt: tunnel.createdAt.toISOString(),
    updatedAt: tunnel.updatedAt.toISOString(),
  };
}

export function toService(service: Service): ServiceDto {
  return {
    id: service.id,
    name: service.name,
    description: service.description,
    unit: service.unit,
    rate: service.rate,
    currency: service.currency,
    tunnelId: service.tunnelId,
    archived: service.archivedAt !== null,
    createdAt: service.createdAt.toISOString(),
    updatedAt: service.updatedAt.toISOString(),
  };
}

/** `entry.actor` should be loaded to show the actor's name. */
export function toAuditEntry(entry: AuditEntry): AuditEntryDto {
  return {
    id: entry.id,
    actorId: entry.actorId,
    actorName: entry.actor?.name ?? null,
    action: entry.action,
    entity: entry.entity,
    entityId: entry.entityId,
    before: entry.before ?? null,
    after: entry.after ?? null,
    createdAt: entry.createdAt.toISOString(),
  };
}
