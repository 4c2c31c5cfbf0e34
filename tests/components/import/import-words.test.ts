import { deleteBayFileQuestion, deleteRecipeQuestion } from '@/components/import/import-words';

describe('deleteBayFileQuestion', () => {
  it('deleteBayFileQuestion, many shots, names the file and the count', () => {
    expect(deleteBayFileQuestion('bay-1.csv', 47)).toBe('Delete bay-1.csv? Its 47 shots leave the analysis.');
  });

  it('deleteBayFileQuestion, one shot, agrees in number', () => {
    expect(deleteBayFileQuestion('bay-1.csv', 1)).toBe('Delete bay-1.csv? Its 1 shot leaves the analysis.');
  });

  it('deleteBayFileQuestion, no shots, does not speak of shots leaving', () => {
    expect(deleteBayFileQuestion('bay-1.csv', 0)).not.toMatch(/leave/);
  });
});

describe('deleteRecipeQuestion', () => {
  it('deleteRecipeQuestion, a name, quotes it and says stored files keep their mapping', () => {
    expect(deleteRecipeQuestion('Bay 2 export')).toBe('Delete the recipe "Bay 2 export"? Bay files already imported with it keep their mapping.');
  });
});
