import { CHANNEL_TABLE, EXTRA_COLUMN_PREFIX as FORMAT_EXTRA_PREFIX } from '../../../../../libs/aero/src/run-file/channel-table';
import { EXTRA_COLUMN_PREFIX, RUN_FILE_CHANNELS } from './run-file-channels';

describe('RUN_FILE_CHANNELS', () => {
  it('names the same channels, in the same order, as the run-file format', () => {
    expect(RUN_FILE_CHANNELS.map((c) => c.id)).toEqual(CHANNEL_TABLE.map((c) => c.id));
  });

  it('marks extra columns with the same prefix as the format', () => {
    expect(EXTRA_COLUMN_PREFIX).toBe(FORMAT_EXTRA_PREFIX);
  });
});
