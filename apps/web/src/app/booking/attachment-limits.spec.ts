import { attachmentLimits, chooseAttachments } from './attachment-limits';

const fileOf = (name: string, size: number) => new File([new Uint8Array(size)], name);

describe('chooseAttachments', () => {
  it('takes drawings and photos of the accepted kinds, whatever the case of the extension', () => {
    const choice = chooseAttachments([fileOf('side view.PNG', 10), fileOf('frame.dxf', 10), fileOf('photo.jpeg', 10)], 0);
    expect(choice.accepted.map((file) => file.name)).toEqual(['side view.PNG', 'frame.dxf', 'photo.jpeg']);
    expect(choice.refusals).toEqual([]);
  });

  it('names each file it leaves out and why', () => {
    const choice = chooseAttachments([fileOf('notes.docx', 10), fileOf('blank.pdf', 0), fileOf('scan.pdf', attachmentLimits.fileSize + 1)], 0);
    expect(choice.accepted).toEqual([]);
    expect(choice.refusals).toEqual(['notes.docx: only PDF, PNG, JPEG, DWG and DXF files are accepted.', 'blank.pdf is empty.', 'scan.pdf is larger than 20 MB.']);
  });

  it('takes a file of exactly the largest size', () => {
    expect(chooseAttachments([fileOf('plan.pdf', attachmentLimits.fileSize)], 0).accepted).toHaveLength(1);
  });

  it('counts the files already chosen against the limit of five', () => {
    const choice = chooseAttachments([fileOf('a.png', 1), fileOf('b.png', 1), fileOf('c.png', 1)], 3);
    expect(choice.accepted.map((file) => file.name)).toEqual(['a.png', 'b.png']);
    expect(choice.refusals).toEqual(['c.png was left out: attach at most 5 files.']);
  });
});
