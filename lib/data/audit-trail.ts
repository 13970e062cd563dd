// The audit trail lives in lib/audit-trail.ts, below lib/auth and lib/photos which write to it
// too. This re-export remains only while lib/data/assessments.ts still imports './audit-trail'.
export { recordAudit, type AuditEntry } from '@/lib/audit-trail';
