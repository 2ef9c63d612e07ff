import { describe, expect, it } from 'vitest';
import { emptyHeader, looksLikeTm27, parseTm27, writeTm27, type Tm27Document } from '../../../../src/lib/spectrum-file/tm27';
import { parseSpectrumUpload } from '../../../../src/lib/spectrum-file/read-upload';
import { EMITTED_QUANTITIES } from '../../../../src/lib/spectrum-file/tm27';

const grid = Array.from({ length: 81 }, (_, i) => 380 + 5 * i);
const band = (peak: number, width: number) => grid.map((w) => Math.exp(-Math.pow((w - peak) / width, 2)) + 0.001);

// A document laid out as IES TM-27-14 describes it (root IESTM2714 in the http://www.ies.org/iestm2714
// namespace, version 1.0; a Header with Description, DocumentCreator and DocumentCreationDate required;
// a SpectralDistribution with SpectralQuantity and SpectralData wavelength="nm" elements). Written by hand.
function handWritten(points: string): string {
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    '<IESTM2714 xmlns="http://www.ies.org/iestm2714" version="1.0">',
    '  <Header>',
    '    <Manufacturer>Kestrel Hollow Lighting</Manufacturer>',
    '    <CatalogNumber>KH-3030-W30</CatalogNumber>',
    '    <Description>Warm white 3030 package, 65 mA, Ts 25 °C</Description>',
    '    <DocumentCreator>KH photometry lab</DocumentCreator>',
    '    <Laboratory>KH photometry lab, sphere 2</Laboratory>',
    '    <ReportNumber>PL-2611-044</ReportNumber>',
    '    <ReportDate>2026-11-30</ReportDate>',
    '    <DocumentCreationDate>2026-12-01</DocumentCreationDate>',
    '    <Comments>Measured at 25 °C solder point</Comments>',
    '  </Header>',
    '  <SpectralDistribution>',
    '    <SpectralQuantity>relative</SpectralQuantity>',
    '    <BandwidthFWHM>2.5</BandwidthFWHM>',
    '    <BandwidthCorrected>true</BandwidthCorrected>',
    points,
    '  </SpectralDistribution>',
    '</IESTM2714>'
  ].join('\n');
}
const pointsOf = (values: number[]) => grid.map((w, i) => `    <SpectralData wavelength="${w}">${values[i]}</SpectralData>`).join('\n');

function doc(distributions: number[][]): Tm27Document {
  return {
    version: '1.0',
    header: {
      ...emptyHeader(),
      manufacturer: 'Kestrel Hollow Lighting',
      catalogNumber: 'KH-Y540',
      description: 'Garnet yellow <lot 7> & "B"',
      documentCreator: 'KH phosphor lab',
      laboratory: 'KH phosphor lab',
      measurementEquipment: 'sphere 2 + array spectrometer',
      documentCreationDate: '2026-12-05',
      comments: 'excited at 450 nm',
      extra: [{ name: 'TestConditions', text: 'Ts 25 °C, 65 mA' }]
    },
    distributions: distributions.map((values) => ({
      spectralQuantity: 'relative',
      reflectionGeometry: null,
      transmissionGeometry: null,
      bandwidthFwhmNm: 2,
      bandwidthCorrected: false,
      extra: [],
      wavelengths: grid,
      values
    }))
  };
}

describe('IES TM-27-14 documents', () => {
  it('reads a hand-written document: header fields, bandwidth, and the spectrum on its wavelengths', () => {
    const values = band(600, 40);
    const r = parseTm27(handWritten(pointsOf(values)));
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.wavelengths).toEqual(grid);
    expect(r.columns).toHaveLength(1);
    expect(r.columns[0].values).toEqual(values);
    expect(r.tm27.header).toMatchObject({
      manufacturer: 'Kestrel Hollow Lighting',
      catalogNumber: 'KH-3030-W30',
      laboratory: 'KH photometry lab, sphere 2',
      reportNumber: 'PL-2611-044',
      comments: 'Measured at 25 °C solder point'
    });
    expect(r.tm27.distributions[0]).toMatchObject({ spectralQuantity: 'relative', bandwidthFwhmNm: 2.5, bandwidthCorrected: true });
  });

  it('round trip: export, then import, gives back the same spectrum and header', () => {
    const original = doc([band(545, 50)]);
    const r = parseTm27(writeTm27(original));
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.wavelengths).toEqual(grid);
    expect(r.columns[0].values).toEqual(original.distributions[0].values); // shortest round-trip number form: exact
    expect(r.tm27.header).toEqual(original.header);
    const { wavelengths: _w, values: _v, ...fields } = original.distributions[0];
    expect(r.tm27.distributions[0]).toEqual(fields);
    // And once more: the written document of the read one is the same text.
    expect(
      writeTm27({
        version: r.tm27.version,
        header: r.tm27.header,
        distributions: [{ ...r.tm27.distributions[0], wavelengths: grid, values: r.columns[0].values }]
      })
    ).toBe(writeTm27(original));
  });

  it('several spectral distributions become several parts (columns) on one grid', () => {
    const r = parseTm27(writeTm27(doc([band(540, 50), band(600, 40), band(620, 45)])), { multiColumn: true });
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.columns.map((c) => c.name)).toEqual(['KH-Y540 1', 'KH-Y540 2', 'KH-Y540 3']);
    expect(r.columns[2].values).toEqual(band(620, 45));
    // A single-spectrum upload refuses a document of three.
    const single = parseTm27(writeTm27(doc([band(540, 50), band(600, 40)])));
    expect(single.ok).toBe(false);
  });

  it('refuses spectra on different grids, saying which', () => {
    const d = doc([band(540, 50), band(600, 40)]);
    d.distributions[1] = { ...d.distributions[1], wavelengths: grid.map((w) => w + 1) };
    const r = parseTm27(writeTm27(d), { multiColumn: true });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0].message).toMatch(/SpectralDistribution 2 has other wavelengths/);
  });

  it('names the line of XML that is not well formed', () => {
    const text = handWritten(pointsOf(band(600, 40))).replace('</Header>', '');
    const r = parseTm27(text);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.errors[0].message).toMatch(/not well formed/);
      expect(r.errors[0].line).toBeGreaterThan(1);
    }
  });

  it('names the line of a value that is not a number (line counted by hand: data starts on line 18)', () => {
    const values = band(600, 40).map(String);
    values[3] = 'n/a';
    const r = parseTm27(handWritten(grid.map((w, i) => `    <SpectralData wavelength="${w}">${values[i]}</SpectralData>`).join('\n')));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors).toEqual([{ line: 21, message: 'Line 21: the value at 395 nm is "n/a", not a number.' }]);
  });

  it('names a missing required element and a wrong spectral quantity', () => {
    const text = handWritten(pointsOf(band(600, 40)))
      .replace(/ *<DocumentCreator>.*\n/, '')
      .replace('<SpectralQuantity>relative', '<SpectralQuantity>brightness');
    const r = parseTm27(text);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      const messages = r.errors.map((e) => e.message).join('\n');
      expect(messages).toMatch(/Header: the DocumentCreator element is missing/);
      expect(messages).toMatch(/SpectralQuantity "brightness" is not one of/);
    }
  });

  it('refuses a wavelength listed twice, naming its line, through the same spectrum rules as a table', () => {
    const lines = pointsOf(band(600, 40)).split('\n');
    lines[5] = lines[5].replace('wavelength="405"', 'wavelength="400"');
    const r = parseTm27(handWritten(lines.join('\n')));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.some((e) => e.line === 22 || e.line === 23)).toBe(true);
  });

  it('reads the older FileCreator element as the document creator', () => {
    const r = parseTm27(handWritten(pointsOf(band(600, 40))).replace(/DocumentCreator>/g, 'FileCreator>'));
    expect(r.ok && r.tm27.header.documentCreator).toBe('KH photometry lab');
  });

  it('tells a TM-27 document from a table, and an upload refuses a quantity it cannot use', () => {
    expect(looksLikeTm27(handWritten(''))).toBe(true);
    expect(looksLikeTm27('\uFEFF<?xml version="1.0"?>\n<!-- c -->\n<IESTM2714 version="1.0">')).toBe(true);
    expect(looksLikeTm27('nm,value\n380,1')).toBe(false);
    const reflectance = writeTm27({
      ...doc([band(600, 40)]),
      distributions: [{ ...doc([band(600, 40)]).distributions[0], spectralQuantity: 'reflectance' }]
    });
    const r = parseSpectrumUpload(reflectance, { quantities: EMITTED_QUANTITIES });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0].message).toMatch(/holds reflectance; this upload takes/);
    const table = parseSpectrumUpload('nm,v\n' + grid.map((w, i) => `${w},${band(600, 40)[i]}`).join('\n'));
    expect(table.ok && table.tm27).toBeNull();
  });
});
