// Source keys used in the limit tables, with what each document is and how it was used.
// From the project's limit specification; a key that says 'not read' means the values citing it
// are from memory and are marked so row by row.
export const LIMIT_SOURCES: Readonly<Record<string, string>> = {
  "EU-FR": "Directive 2006/25/EC Annex II as transposed verbatim into the French Code du travail, partie reglementaire, 4e partie, livre IV, titre V, chapitre II, Annexe II (Tableaux 2.1, 2.2, 2.4, 2.5, 2.6); read in the public Markdown copy of the French codes (GitHub etalab/codes-juridiques-francais). Tableau 2.3 is not reproduced there.",
  "EU-NO": "Norway, Regulations concerning Action and Limit Values, Annex 4 'Optical radiation from lasers', Table 4.5 (= Directive 2006/25/EC Annex II Table 2.5), English version at arbeidstilsynet.no; read.",
  "EU-CONS": "Directive 2006/25/EC consolidated text CELEX 02006L0025-20190726, Annex II Table 2.6 (repetitive exposure rules, Tmin); read as an excerpt on a legislation search site.",
  "EU-2.3-MEM": "Directive 2006/25/EC Annex II Table 2.3 (eye, t >= 10 s) and its notes: NOT read (the French copy only points to the Journal officiel PDF); values from memory, cross-checked for continuity with the read Table 2.2 at t = 10 s.",
  "BGI832": "BGI 832 (German statutory accident insurance guidance 'Betrieb von Laser-Einrichtungen', MPE tables after IEC 60825-1:2001), Tabelle 6a (cornea MPE 1e-13 s to 10 s), Tabelle 4 (Ti), notes on C5 and N; read as page excerpts (yumpu copy).",
  "BGVB2": "BGV B2 'Laserstrahlung' (German accident prevention regulation), implementation notes, Tabelle 5 (limiting apertures) and acceptance angle gamma_p; read (umwelt-online copy).",
  "ICNIRP2000": "ICNIRP, Revision of guidelines on limits of exposure to laser radiation of wavelengths between 400 nm and 1.4 um, Health Phys. 79(4):431-440, 2000; introduction read (fdocument.org copy): revision limited to 400-1400 nm, no change between 1 ns and 10 s for intrabeam viewing.",
  "ICNIRP2013": "ICNIRP, Guidelines on limits of exposure to laser radiation of wavelengths between 180 nm and 1,000 um, Health Phys. 105(3):271-295, 2013; NOT read (full text not available in the searchable store); values from memory.",
  "IEC2014": "IEC 60825-1:2014 (Ed. 3) Annex A, Tables A.1-A.5 and Table 10 / subclause 4.3 f); NOT read; from memory.",
  "ANSI2014": "ANSI Z136.1-2014, Tables 5a, 5b, 6, 7, 8; NOT read; from memory.",
  "CORNEA2024": "Schulmeister K, Stuck BE, Comparison of laser induced corneal injury thresholds with safety limits for 1200-1500 nm, J. Laser Appl. 36(3), 2024 (and the earlier ILSC paper 'Comparison of corneal injury thresholds with laser safety limits'); abstracts read: ANSI has a dedicated corneal MPE below 1400 nm, ICNIRP 2013 recommends the skin MPE for the cornea, IEC 60825-1:2014 uses the Class 3B AEL as dual limit for Class 1.",
  "ILSC2019": "ILSC 2019 proceedings, paper P106 (multiple-pulse thresholds for cornea and skin); abstract read: in ANSI Z136.1, IEC 60825-1 and ICNIRP the factor CP is applied only to retinal thermal limits; cornea and skin use the single-pulse and average-irradiance criteria only.",
  "ILSC2007": "Schulmeister K, Stuck B, Lund DJ, Sliney DH, Proposed changes for the retinal thermal MPE, ILSC 2007; abstract read: pulse-duration-dependent alpha_max from 5 mrad (short pulses) to 100 mrad (long), nanosecond retinal limits to be lowered.",
  "ICNIRP2020": "ICNIRP statement on the 2013 laser guidelines, Health Phys. 2020 (summary on arpansa.gov.au read): clarifies application, does not amend the limits.",
  "OURS": "Implementation choice made for this specification (not from a published source, not claimed as common practice)."
};
