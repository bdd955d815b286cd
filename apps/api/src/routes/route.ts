import type { Request, RequestHandler, Response } from 'express';
import type { Role } from '@tunnelwright/contracts';
import type { User } from '@tunnelwright/db';
import type { z } from 'zod';
import type { AppConfig } from '../config';
import type { AppDeps } from '../deps';

/** Who may call a route: anybody, anybody signed in, or the listed roles. */
export type Access = 'public' | 'authenticated' | readonly Role[];

/** Records the role × route matrix can ask for when it exercises a route; built by the test fixtures. */
export interface SampleFixtures {
  /** A live tunnel of the lab. */
  tunnelId(): Promise<string>;
  /** A live service of the lab. */
  serviceId(): Promise<string>;
  /** A fresh, signed-up customer user of the first customer organisation (password: `password`). */
  customerUser(): Promise<{ id: string; email: string }>;
  /** The first customer organisation (the one the matrix's own customer belongs to). */
  customerOrganisationId(): Promise<string>;
  /** A fresh, unused invitation token. */
  invitationToken(): Promise<string>;
  /** A fresh, unused password-reset token. */
  passwordResetToken(): Promise<string>;
  /** A string unique to this call, for names and e-mail addresses that must not clash. */
  unique(): string;
  /** The demo password every fixture user has. */
  password: string;
}

/** How the role × route matrix exercises a route as a caller who is allowed to. */
export interface RouteSample {
  params?: (fixtures: SampleFixtures) => Promise<Record<string, string>>;
  body?: (fixtures: SampleFixtures) => Promise<unknown> | unknown;
  query?: Record<string, string>;
  /** Status an allowed caller gets with this sample. */
  expect: number;
  /** Whether the record belongs to the matrix customer's organisation, so a customer of another one gets 404. */
  crossOrganisation?: boolean;
}

/** What a handler gets: the request, the parsed body and query, and the signed-in caller. */
export interface RouteContext<B, Q> {
  req: Request;
  res: Response;
  deps: AppDeps;
  body: B;
  query: Q;
  params: Record<string, string>;
  /** The signed-in user; reading it on a public route without a token throws a 401. */
  readonly caller: User;
  /** The signed-in user if there is one. */
  readonly maybeCaller: User | undefined;
}

type Parsed<S> = S extends z.ZodType ? z.output<S> : undefined;

/** One entry of the route table, before its handler types are erased. */
export interface RouteSpec<B extends z.ZodType | undefined, Q extends z.ZodType | undefined> {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  /** Path relative to the resource's mount point, Express syntax (`/:id`). */
  path: string;
  access: Access;
  summary: string;
  body?: B;
  query?: Q;
  /** Extra middleware run before validation, e.g. rate limits. */
  middleware?: (deps: AppDeps) => RequestHandler[];
  /** Whether the route exists under this configuration (default: always). */
  enabled?: (config: AppConfig) => boolean;
  handler: (ctx: RouteContext<Parsed<B>, Parsed<Q>>) => Promise<void>;
  sample: RouteSample;
}

/** A route table entry with its types erased, as the router builder and the test matrix see it. */
export type RouteDef = RouteSpec<z.ZodType | undefined, z.ZodType | undefined>;

/** Declares one route; the generic parameters give the handler typed `body` and `query`. */
export function route<B extends z.ZodType | undefined = undefined, Q extends z.ZodType | undefined = undefined>(spec: RouteSpec<B, Q>): RouteDef {
  return spec as unknown as RouteDef;
}

/** The routes of one resource and where they are mounted. */
export interface Resource {
  mount: string;
  routes: RouteDef[];
}
