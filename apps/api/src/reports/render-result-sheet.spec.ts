import { beforeAll, describe, expect, it } from 'vitest';
import { DESIGN_CAUTION } from '@tunnelwright/aero';
import { sha256Hex, verifyIssuedFile } from './issued-file-hash';
import { END_OF_REPORT_MARK, ITEMS_TESTED_STATEMENT, renderResultSheet, REPRODUCTION_STATEMENT } from './render-result-sheet';
import type { ResultSheetData } from './result-sheet-data';
import { buildSampleResultSheet } from './sample-result-sheet';
import { formatDate, formatMeasured, formatNumber } from './sheet-format';
import { decodeQrOnPage, flat, pdfImages, pdfPageTexts, requirePoppler } from './testing/pdf-readback';

/**
 * The sheet is read back as a reader would see it (pdftotext -layout, pdftoppm), and each reporting requirement of
 * ISO/IEC 17025:2017 §7.8.2.1 (a)–(p) and §7.8.3.1 is checked on the printed text.
 */
let data: ResultSheetData;
let pdf: Buffer;
let pages: string[];
let all: string;

beforeAll(async () => {
  requirePoppler();
  data = await buildSampleResultSheet();
  pdf = await renderResultSheet(data);
  pages = pdfPageTexts(pdf);
  all = flat(pages.join('\n'));
}, 60_000);

describe('certified result sheet: ISO/IEC 17025:2017 §7.8.2.1', () => {
  it('(a) states a title', () => {
    expect(all).toContain('CERTIFIED RESULT SHEET');
    expect(all).toContain(data.report.title);
  });

  it('(b) gives the name and address of the laboratory', () => {
    expect(all).toContain(data.laboratory.name);
    for (const line of data.laboratory.addressLines) expect(all).toContain(line);
  });

  it('(c) gives the location where the laboratory activities were performed', () => {
    expect(all).toContain(`Tests carried out at ${data.laboratory.testLocation}`);
  });

  it('(d) identifies every page as part of the report, with page x of y, and marks the end', () => {
    expect(pages.length).toBeGreaterThan(1);
    pages.forEach((text, i) => {
      expect(text).toContain(data.report.number);
      expect(text).toContain(`Page ${i + 1} of ${pages.length}`);
    });
    expect(flat(pages.at(-1) ?? '')).toContain(`${END_OF_REPORT_MARK} ${data.report.number}`);
    pages.slice(0, -1).forEach((text) => expect(text).not.toContain(END_OF_REPORT_MARK));
  });

  it('(e) gives the name and contact information of the customer', () => {
    expect(all).toContain(data.customer.name);
    expect(all).toContain(data.customer.contactName);
    expect(all).toContain(data.customer.contactEmail);
  });

  it('(f) identifies the method used, with corrections, density model and engine version', () => {
    expect(all).toContain(data.method.documentedMethod);
    for (const c of data.method.correctionMethods) expect(all).toContain(c);
    expect(all).toContain(data.method.densityModel);
    expect(all).toContain(data.method.engineVersion);
    for (const s of data.method.standardsFollowed) expect(all).toContain(s);
  });

  it('(g) describes and identifies the item and states its condition on receipt', () => {
    expect(all).toContain(data.article.description);
    expect(all).toContain(data.article.identification);
    expect(all).toContain(`Condition on receipt ${data.article.conditionOnReceipt}`);
  });

  it('(h) gives the date of receipt of the item, and says so when the laboratory did not record it', async () => {
    expect(data.dates.receipt).not.toBeNull();
    expect(all).toContain(`Item received ${formatDate(data.dates.receipt!)}`);
    const unrecorded = flat(pdfPageTexts(await renderResultSheet({ ...data, dates: { ...data.dates, receipt: null } })).join('\n'));
    expect(unrecorded).toContain('Item received Date of receipt not recorded');
  });

  it('(i) gives the dates the tests were performed', () => {
    expect(all).toContain(`Tests performed ${data.dates.testDates.map(formatDate).join(', ')}`);
  });

  it('(j) gives the date of issue', () => {
    expect(all).toContain(`Sheet issued ${formatDate(data.dates.issue)}`);
  });

  it('(k) states that sampling does not apply, and why', () => {
    expect(data.sampling.applicable).toBe(false);
    const reason = data.sampling.applicable ? '' : data.sampling.reason;
    expect(all).toContain(`Sampling Not applicable. ${reason}`);
  });

  it('(l) states that the results relate only to the items tested', () => {
    expect(all).toContain(ITEMS_TESTED_STATEMENT);
    expect(ITEMS_TESTED_STATEMENT).toBe('Results relate only to the item(s) tested, as received.');
  });

  it('(m) reports every point of every configuration with units and U (k = 2)', () => {
    for (const unit of ['[deg]', '[m/s]', '[Pa]', '[kg/m³]', '[hPa]', '[°C]', '[m²]']) expect(all).toContain(unit);
    for (const c of data.configurations) {
      expect(all).toContain(`Configuration ${c.code}: ${c.label} (run ${c.runNumber}`);
      for (const p of c.points) {
        const row = [p.dragCoefficient, p.liftCoefficient, p.sideForceCoefficient, p.rollingMomentCoefficient, p.pitchingMomentCoefficient, p.yawingMomentCoefficient]
          .map((m) => formatMeasured(m, 4))
          .concat(formatMeasured(p.dragArea, 5))
          .join(' ');
        expect(all).toContain(`${p.point} ${row}`);
        const setpoint = [formatNumber(p.yaw, 1), formatNumber(p.conditions.speed, 2), formatNumber(p.conditions.dynamicPressure, 1), formatNumber(p.conditions.reynoldsNumber / 1e6, 3)];
        expect(all).toContain(`${p.point} ${setpoint.join(' ')}`);
      }
    }
    expect(all).toContain(`Reference area S = ${formatNumber(data.article.referenceArea, 4)} m² (frontal area)`);
  });

  it('(n) lists the deviations and exclusions from the method with reasons, and every excluded point', () => {
    for (const d of data.deviations) expect(all).toContain(`${d.description}. Reason: ${d.reason}.`);
    expect(data.exclusions.length).toBeGreaterThan(0);
    for (const e of data.exclusions) expect(all).toContain(`Configuration ${e.configurationCode}, run ${e.runNumber}, point ${e.point}: ${e.reason}.`);
  });

  it('(o) identifies the person authorising the report, with role and date', () => {
    expect(all).toContain(`Authorised for issue by ${data.authorisation.name} ${data.authorisation.role}`);
    expect(all).toContain(`Date of authorisation: ${formatDate(data.authorisation.date)}`);
  });

  it('(p) states that no results come from external providers', () => {
    expect(data.externalProviders).toEqual([]);
    expect(all).toContain('External providers None: all results in this sheet were produced by the laboratory.');
  });
});

describe('certified result sheet: ISO/IEC 17025:2017 §7.8.3.1', () => {
  it('(a) gives the test conditions: air state, speeds and Reynolds numbers of each configuration', () => {
    const conditions = all;
    expect(conditions).toContain('5 Test conditions');
    expect(conditions).toContain(
      'Barometric p Air temp. Humidity Air density Speed V Dyn. pressure q Re [hPa] [°C] [% RH] [kg/m³] [m/s] [Pa] [×10^6]',
    );
    const baseline = data.configurations[0];
    const densities = baseline.points.map((p) => p.conditions.density);
    expect(conditions).toContain(`${formatNumber(Math.min(...densities), 4)} – ${formatNumber(Math.max(...densities), 4)}`);
  });

  it('(b) says that no statement of conformity is made', () => {
    expect(all).toContain('No statement of conformity to a specification was requested, and none is made.');
  });

  it('(c) gives the measurement uncertainty in the unit of each value, with its coverage factor', () => {
    expect(all).toContain('expanded uncertainty U (coverage factor k = 2, about 95 %), in the unit of the value');
    expect(all).toContain(data.method.uncertaintyMethod);
    const p = data.configurations[0].points[0];
    expect(all).toContain(formatMeasured(p.dragCoefficient, 4));
    expect(p.dragCoefficient.expandedUncertainty).toBeGreaterThan(0);
  });

  it('(d) says that no opinions or interpretations are given', () => {
    expect(all).toContain('No opinions or interpretations are given.');
  });
});

describe('certified result sheet: statements, charts and verification', () => {
  it('forbids partial reproduction and cautions that tunnel results are not design loads', () => {
    expect(all).toContain(REPRODUCTION_STATEMENT);
    expect(all).toContain('Caution: tunnel results are not design loads.');
    expect(all).toContain(DESIGN_CAUTION);
    // Outside the caution, nothing on the sheet speaks of design: no figure is offered as a design value.
    const rest = all.replace(DESIGN_CAUTION, '').replace('Caution: tunnel results are not design loads.', '');
    expect(rest).not.toMatch(/design/i);
  });

  it('embeds four charts at print resolution (200 ppi) and a QR code on every page', () => {
    const images = pdfImages(pdf);
    const charts = images.filter((i) => i.width >= 1400);
    expect(charts).toHaveLength(4);
    for (const c of charts) expect(c.xPpi).toBeGreaterThanOrEqual(199);
    const qrPages = new Set(images.filter((i) => i.width === i.height).map((i) => i.page));
    expect([...qrPages].sort((a, b) => a - b)).toEqual(pages.map((_, i) => i + 1));
    for (let n = 1; n <= 4; n++) expect(all).toContain(`Figure ${n}.`);
  });

  it('has a QR code on page 1 that decodes to the verification URL, as does the one on the last page', async () => {
    expect(data.verificationUrl).toBe(`https://results.harrowgate-flow.example/verify/${data.report.number}`);
    expect(await decodeQrOnPage(pdf, 1)).toBe(data.verificationUrl);
    expect(await decodeQrOnPage(pdf, pages.length)).toBe(data.verificationUrl);
  }, 30_000);

  it('renders equal input to equal bytes', async () => {
    const again = await renderResultSheet(data);
    expect(sha256Hex(again)).toBe(sha256Hex(pdf));
  }, 30_000);

  it('verifies the issued file and refuses a copy with one byte changed', () => {
    const hash = sha256Hex(pdf);
    expect(hash).toMatch(/^[0-9a-f]{64}$/);
    expect(verifyIssuedFile(pdf, hash)).toBe(true);
    expect(verifyIssuedFile(pdf, hash.toUpperCase())).toBe(true);
    const changed = Buffer.from(pdf);
    const at = Math.floor(changed.length / 2);
    changed[at] = changed[at] ^ 0x01;
    expect(verifyIssuedFile(changed, hash)).toBe(false);
    expect(verifyIssuedFile(pdf, 'not-a-hash')).toBe(false);
  });
});

describe('certified result sheet: a superseded revision with an external provider', () => {
  let texts: string[];
  let superseded: ResultSheetData;

  beforeAll(async () => {
    const base = await buildSampleResultSheet({
      supersededBy: { number: 'TW-2026-0147', revision: 2, issueDate: '2026-11-20', reason: 'reference area re-measured' },
    });
    superseded = {
      ...base,
      externalProviders: [{ name: 'Kettlewell Metrology (invented)', activity: 'calibration of the balance HB-6', affectedResults: 'all force and moment coefficients' }],
    };
    texts = pdfPageTexts(await renderResultSheet(superseded));
  }, 60_000);

  it('marks every page as superseded and points page 1 to the successor', () => {
    texts.forEach((text) => expect(text).toContain('SUPERSEDED by TW-2026-0147 revision 2'));
    expect(flat(texts[0])).toContain('It is replaced by report TW-2026-0147 revision 2, issued 20 November 2026 (reference area re-measured).');
  });

  it('§7.8.2.1 (p) identifies results from an external provider', () => {
    expect(flat(texts.join('\n'))).toContain(
      'Kettlewell Metrology (invented): calibration of the balance HB-6. Results from this provider: all force and moment coefficients.',
    );
  });
});
