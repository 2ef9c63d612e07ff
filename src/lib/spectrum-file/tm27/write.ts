/**
 * Writer of IES TM-27-14 spectral data documents (XML; Illuminating Engineering Society, 2014),
 * built with fast-xml-parser's XMLBuilder. Header elements in the standard's order, then the
 * elements kept from a file that was read (`extra`), then one SpectralDistribution per spectrum.
 * Numbers are written with enough digits to read back exactly (shortest round-trip form).
 */
import { XMLBuilder } from 'fast-xml-parser';
import { HEADER_FIELDS, TM27_NAMESPACE, TM27_VERSION, type Tm27Document } from './document';

const builder = new XMLBuilder({
  ignoreAttributes: false,
  attributeNamePrefix: '@_',
  format: true,
  indentBy: '  ',
  suppressEmptyNode: false
});

type Node = Record<string, unknown>;

function withExtras(node: Node, extra: { name: string; text: string }[]): Node {
  for (const e of extra) {
    const prior = node[e.name];
    node[e.name] = prior === undefined ? e.text : [...(Array.isArray(prior) ? prior : [prior]), e.text];
  }
  return node;
}

export function writeTm27(doc: Tm27Document): string {
  const header: Node = {};
  for (const f of HEADER_FIELDS) {
    const v = doc.header[f.key];
    if (v !== null && v !== '') header[f.element] = v;
  }
  withExtras(header, doc.header.extra);
  const distributions = doc.distributions.map((d) => {
    if (d.wavelengths.length !== d.values.length) throw new Error('A spectral distribution needs one value per wavelength.');
    const node: Node = { SpectralQuantity: d.spectralQuantity };
    if (d.reflectionGeometry) node.ReflectionGeometry = d.reflectionGeometry;
    if (d.transmissionGeometry) node.TransmissionGeometry = d.transmissionGeometry;
    if (d.bandwidthFwhmNm !== null) node.BandwidthFWHM = String(d.bandwidthFwhmNm);
    if (d.bandwidthCorrected !== null) node.BandwidthCorrected = String(d.bandwidthCorrected);
    withExtras(node, d.extra);
    node.SpectralData = d.wavelengths.map((wl, i) => ({ '@_wavelength': String(wl), '#text': String(d.values[i]) }));
    return node;
  });
  const body = builder.build({
    IESTM2714: { '@_xmlns': TM27_NAMESPACE, '@_version': doc.version || TM27_VERSION, Header: header, SpectralDistribution: distributions }
  }) as string;
  return `<?xml version="1.0" encoding="UTF-8"?>\n${body}`;
}
