/** Names the computation behind stored part metrics, kept beside them so later readers know. */
export const QUALITY_CORE_VERSION = 'phosforge-core 0.1.0 (CIE 15, Ohno 2014, CIE 13.3, CIE 224)';
