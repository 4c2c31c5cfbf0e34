import { mappingBlocker, type MappingReadiness } from '@/components/import/mapping-blocker';

const ready: MappingReadiness = {
  hasPreview: true,
  noPreview: 'Choose a file first.',
  duplicate: false,
  buildsComplete: true,
  previewFailed: false,
  previewBehind: false,
  shotCount: 12,
};

describe('mappingBlocker', () => {
  it('mappingBlocker, a current preview with shots, lets the file go', () => {
    expect(mappingBlocker(ready)).toBeNull();
  });

  it('mappingBlocker, no preview yet, says what the page is waiting for', () => {
    expect(mappingBlocker({ ...ready, hasPreview: false, noPreview: 'Reading the stored file…' })).toBe('Reading the stored file…');
  });

  it('mappingBlocker, several problems, names the first to fix (duplicate before builds before the preview)', () => {
    const all = { ...ready, duplicate: true, buildsComplete: false, previewFailed: true, previewBehind: true, shotCount: 0 };
    expect(mappingBlocker(all)).toBe('This file is already in the fitting.');
    expect(mappingBlocker({ ...all, duplicate: false })).toBe('Name the build first.');
    expect(mappingBlocker({ ...all, duplicate: false, buildsComplete: true })).toBe('Fix the problem above first.');
    expect(mappingBlocker({ ...all, duplicate: false, buildsComplete: true, previewFailed: false })).toBe('Updating the preview…');
  });

  it('mappingBlocker, a current preview converting no row, blocks (the server would answer NO_SHOTS)', () => {
    expect(mappingBlocker({ ...ready, shotCount: 0 })).toBe('No row converts to a shot with this mapping.');
  });
});
