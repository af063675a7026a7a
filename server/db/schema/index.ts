export * from './users';
export * from './restorations';
export * from './memberships';
export * from './dev-mails';
export * from './auth';
export * from './invitations';
export * from './photos';
export * from './findings';
