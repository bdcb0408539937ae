import { createAccessControl } from 'better-auth/plugins/access';
import { defaultStatements as accountStatements, userAc } from 'better-auth/plugins/admin/access';
import { defaultStatements as householdBaseStatements, memberAc, ownerAc } from 'better-auth/plugins/organization/access';

/**
 * Who may do what on a rig: the one permissions table, used by the server's middleware on every route and
 * by the client to hide what a role cannot do. Household roles: owner, member, advisor.
 * Anyone who is not in a rig's household gets nothing (the API answers 404 so rigs cannot be discovered).
 */
export const householdStatements = {
  ...householdBaseStatements,
  rig: ['read', 'update', 'delete'],
  // A member edits and deletes the loads they added (-own); an owner any load (-any).
  load: ['create', 'update-own', 'delete-own', 'update-any', 'delete-any'],
  reading: ['create', 'update', 'delete'],
  cableRun: ['create', 'update', 'delete'],
  trip: ['create', 'update', 'delete'],
  note: ['create'],
  people: ['read', 'manage'],
} as const;

export const householdAc = createAccessControl(householdStatements);

export const householdRoles = {
  owner: householdAc.newRole({
    ...ownerAc.statements,
    rig: ['read', 'update', 'delete'],
    load: ['create', 'update-own', 'delete-own', 'update-any', 'delete-any'],
    reading: ['create', 'update', 'delete'],
    cableRun: ['create', 'update', 'delete'],
    trip: ['create', 'update', 'delete'],
    note: ['create'],
    people: ['read', 'manage'],
  }),
  member: householdAc.newRole({
    ...memberAc.statements,
    rig: ['read'],
    load: ['create', 'update-own', 'delete-own'],
    reading: ['create', 'update', 'delete'],
    cableRun: ['create', 'update', 'delete'],
    trip: ['create', 'update', 'delete'],
    note: ['create'],
    people: ['read'],
  }),
  // An installer or auto electrician: reads everything and comments; changes nothing.
  advisor: householdAc.newRole({ rig: ['read'], note: ['create'], people: ['read'] }),
};

export type HouseholdRole = keyof typeof householdRoles;
export const HOUSEHOLD_ROLES = Object.keys(householdRoles) as HouseholdRole[];
export type Resource = keyof typeof householdStatements;
export type Permission = { [R in Resource]?: (typeof householdStatements)[R][number][] };

/** Whether a household role may do something; a missing or unknown role may do nothing. */
export function can(role: string | null | undefined, permission: Permission): boolean {
  if (!role || !(role in householdRoles)) return false;
  return householdRoles[role as HouseholdRole].authorize(permission as never).success;
}

// Account roles (better-auth's admin plugin): traveller by default, advisor, admin.
export const accountAc = createAccessControl(accountStatements);
export const accountRoles = {
  traveller: accountAc.newRole({ ...userAc.statements }),
  advisor: accountAc.newRole({ ...userAc.statements }),
  // Runs the service: lists accounts and sets their roles. No impersonation, sessions, passwords or edits
  // of other accounts (PRODUCT.md: an admin sees no private budgets unless invited).
  admin: accountAc.newRole({ user: ['list', 'set-role'] }),
};
export type AccountRole = keyof typeof accountRoles;
export const ACCOUNT_ROLES = Object.keys(accountRoles) as AccountRole[];
