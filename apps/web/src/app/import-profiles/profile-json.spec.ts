import { EMPTY_PROFILE_FORM, formFromProfile, profileChanges, profileFromForm, type ProfileFormValue } from './profile-json';

const legacyLayout: ProfileFormValue = {
  name: '  Semicolon logger  ',
  description: 'invented',
  delimiter: ';',
  decimalComma: true,
  skipLines: 2,
  unitsRow: true,
  unmappedColumns: 'keep',
  columns: [
    { source: ' qinf ', channel: 'q', unit: '', scale: null, drop: false },
    { source: 'side', channel: 'Fy', unit: 'N', scale: -1, drop: false },
    { source: 'comment', channel: '', unit: '', scale: null, drop: true },
  ],
};

describe('profileFromForm', () => {
  it('trims the texts and leaves out an empty channel, unit and scale so the source keeps them', () => {
    expect(profileFromForm(legacyLayout)).toEqual({
      name: 'Semicolon logger',
      delimiter: ';',
      decimalComma: true,
      skipLines: 2,
      unitsRow: true,
      unmappedColumns: 'keep',
      columns: [
        { source: 'qinf', channel: 'q', drop: false },
        { source: 'side', channel: 'Fy', unit: 'N', scale: -1, drop: false },
        { source: 'comment', drop: true },
      ],
    });
  });

  it('treats an empty line count as none to skip', () => {
    expect(profileFromForm({ ...EMPTY_PROFILE_FORM, name: 'x', skipLines: null }).skipLines).toBe(0);
  });
});

describe('formFromProfile', () => {
  it('gives back the form a profile was built from', () => {
    const json = profileFromForm(legacyLayout);
    expect(profileFromForm(formFromProfile('Semicolon logger', 'invented', { ...json }))).toEqual(json);
  });

  it('fills the schema defaults for fields a stored profile leaves out', () => {
    expect(formFromProfile('Bare', '', { name: 'Bare' })).toEqual({ ...EMPTY_PROFILE_FORM, name: 'Bare' });
  });
});

describe('profileChanges', () => {
  it('names every change a profile makes to a standard file', () => {
    expect(profileChanges({ ...profileFromForm(legacyLayout) })).toEqual([
      'semicolon between fields',
      'decimal comma',
      'skips 2 line(s) before the names',
      'units in their own row',
      'renames 2 column(s)',
      'scales 1 column(s)',
      'leaves out 1 column(s)',
    ]);
  });

  it('says so when a profile changes nothing', () => {
    expect(profileChanges({ name: 'Same' })).toEqual(['nothing: reads like a standard run file']);
  });
});
