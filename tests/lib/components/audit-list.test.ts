import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { AuditList } from '@/components/admin/audit-list';

describe('audit list', () => {
  it('says so when nothing has been recorded, instead of an empty table', () => {
    const html = renderToStaticMarkup(createElement(AuditList, { entries: [] }));
    expect(html).toContain('data-testid="audit-empty"');
    expect(html).toContain('Nothing has been recorded yet');
  });

  it('labels each field of an entry for narrow screens', () => {
    const entry = {
      id: 1,
      actor: 'admin@kestrelvale.example',
      action: 'invitation.revoke',
      entity: 'invitation',
      entityId: '7',
      detail: '{"email":"a@b.example"}',
      createdAt: '2026-12-02T10:00:00.000Z',
    };
    const html = renderToStaticMarkup(createElement(AuditList, { entries: [entry] }));
    expect(html).toContain('2026-12-02 10:00 UTC');
    expect(html).toMatch(/Who: <\/span>admin@kestrelvale.example/);
  });
});
