import { storedUploadFile } from '@/components/import/text-request';

describe('storedUploadFile', () => {
  it('storedUploadFile, text with a degree sign, is a file of that name and its UTF-8 byte length', () => {
    // "°" (U+00B0) takes two bytes in UTF-8 (RFC 3629, 2003, section 3: U+0080..U+07FF → 2 bytes).
    const file = storedUploadFile('Club,Loft\n56°,56\n', 'wedges.csv');
    expect(file.name).toBe('wedges.csv');
    expect(file.size).toBe('Club,Loft\n56°,56\n'.length + 1);
    expect(file.type).toBe('text/csv');
  });
});
