// Exposure-limit table for the rule set 'icnirp2013' (ICNIRP 2013 / IEC 60825-1:2014 / ANSI Z136.1-2014 (harmonised)).
// DATA, not logic: each row carries its band, duration range, quantity, expression, source and
// confidence exactly as in the project's limit specification (exposure-limits spec, schema
// version 1.0). The engine in ../exposure-limit.ts evaluates these rows; nothing
// here is computed. Source keys are explained in ./sources.ts.
// Generated once from the specification's JSON and reviewed by hand; edit rows here, with a source.
import type { RuleSetTable } from '../table-types.js';

export const ICNIRP2013_TABLE: RuleSetTable = {
  "id": "icnirp2013",
  "specKey": "ICNIRP2013_IEC60825-1-2014_ANSI-Z136.1-2014",
  "title": "ICNIRP 2013 / IEC 60825-1:2014 / ANSI Z136.1-2014 (harmonised)",
  "status": "Whole set typed from memory; the original documents were not available to re-read. Values identical to the EU set are backed by the read EU text. Verify every 'memory' and 'memory-uncertain' entry against the originals before release.",
  "factors": {
    "CA": {
      "pieces": [
        {
          "band_nm": [
            180,
            700
          ],
          "expr": "1",
          "source": "ICNIRP2013; IEC2014 correction-factor table (from memory); same as EU Tab. 2.5 (read)",
          "confidence": "from memory"
        },
        {
          "band_nm": [
            700,
            1050
          ],
          "expr": "10^(0.002*(lambda-700))",
          "source": "ICNIRP2013; IEC2014 correction-factor table (from memory); same as EU Tab. 2.5 (read)",
          "confidence": "from memory"
        },
        {
          "band_nm": [
            1050,
            1400
          ],
          "expr": "5",
          "source": "ICNIRP2013; IEC2014 correction-factor table (from memory); same as EU Tab. 2.5 (read)",
          "confidence": "from memory"
        }
      ],
      "note": "Retinal thermal wavelength factor (IEC symbol C4)."
    },
    "CB": {
      "pieces": [
        {
          "band_nm": [
            400,
            450
          ],
          "expr": "1",
          "source": "ICNIRP2013; IEC2014 correction-factor table (from memory); same as EU Tab. 2.5 (read)",
          "confidence": "from memory"
        },
        {
          "band_nm": [
            450,
            700
          ],
          "expr": "10^(0.02*(lambda-450))",
          "source": "ICNIRP2013; IEC2014 correction-factor table (from memory); same as EU Tab. 2.5 (read)",
          "confidence": "from memory"
        }
      ],
      "note": "Photochemical (blue-light) factor (IEC symbol C3). The EU table defines it up to 700 nm, but the photochemical limits are only used for 400-600 nm."
    },
    "CE": {
      "pieces": [
        {
          "alpha_mrad": "alpha <= alpha_min",
          "expr": "1"
        },
        {
          "alpha_mrad": "alpha_min < alpha <= alpha_max",
          "expr": "alpha/alpha_min"
        },
        {
          "alpha_mrad": "alpha > alpha_max",
          "expr": "alpha^2/(alpha_min*alpha_max)"
        }
      ],
      "source": "ICNIRP2013; IEC2014; ANSI2014 Tab. 6 (from memory)",
      "confidence": "from memory",
      "note": "alpha_max depends on t (see alpha_max). IEC 60825-1 writes C6 = alpha_max/alpha_min for alpha > alpha_max and limits the measurement field of view to alpha_max instead; for a uniform source this is numerically equivalent."
    },
    "alpha_min": {
      "value": 1.5,
      "unit": "mrad",
      "source": "ICNIRP2013; IEC2014; ANSI2014 (from memory); same as EU Tab. 2.5 (read)",
      "confidence": "from memory"
    },
    "T2": {
      "pieces": [
        {
          "alpha_mrad": "alpha < 1.5",
          "expr": "10"
        },
        {
          "alpha_mrad": "1.5 <= alpha <= 100",
          "expr": "10*10^((alpha-1.5)/98.5)"
        },
        {
          "alpha_mrad": "alpha > 100",
          "expr": "100"
        }
      ],
      "unit": "s",
      "source": "ICNIRP2013; IEC2014 (from memory); same as EU Tab. 2.5 (read)",
      "confidence": "from memory",
      "note": "Time after which the retinal thermal limit for an extended source becomes a constant irradiance (eye movements spread the image)."
    },
    "gamma_p": {
      "pieces": [
        {
          "t_s": [
            10,
            100
          ],
          "expr": "11"
        },
        {
          "t_s": [
            100,
            10000.0
          ],
          "expr": "1.1*t^0.5"
        },
        {
          "t_s": [
            10000.0,
            30000.0
          ],
          "expr": "110"
        }
      ],
      "unit": "mrad",
      "source": "ICNIRP2013; IEC2014 (from memory); same as EU Tab. 2.5 (read)",
      "confidence": "from memory",
      "note": "Limiting cone angle (field of view) for measuring exposure against the photochemical limits (400-600 nm). If alpha < gamma_p the field of view must include the whole source; for a point source the whole beam counts."
    },
    "CC": {
      "pieces": [
        {
          "band_nm": [
            700,
            1150
          ],
          "expr": "1",
          "source": "ICNIRP2013; IEC2014 (from memory); same as EU Tab. 2.5 (read)",
          "confidence": "from memory"
        },
        {
          "band_nm": [
            1150,
            1200
          ],
          "expr": "10^(0.018*(lambda-1150))",
          "source": "ICNIRP2013; IEC2014 (from memory); same as EU Tab. 2.5 (read)",
          "confidence": "from memory"
        },
        {
          "band_nm": [
            1200,
            1400
          ],
          "expr": "8+10^(0.04*(lambda-1250))",
          "source": "ICNIRP2013; IEC2014 (C7); ANSI2014 Tab. 6 (from memory)",
          "confidence": "from memory, uncertain",
          "conservative_alt": "8"
        }
      ],
      "note": "From memory, the 2013/2014 documents raise CC above 1250 nm (retina protected by ocular-media absorption; the cornea then needs its own limit, see the dual corneal rows). Until verified, use min(expr, conservative_alt) i.e. CC = 8 for 1200-1400 nm, which is the EU value."
    },
    "alpha_max": {
      "pieces": [
        {
          "t_s": [
            0,
            0.000625
          ],
          "expr": "5"
        },
        {
          "t_s": [
            0.000625,
            0.25
          ],
          "expr": "200*t^0.5"
        },
        {
          "t_s": [
            0.25,
            30000.0
          ],
          "expr": "100"
        }
      ],
      "unit": "mrad",
      "source": "ICNIRP2013; IEC2014 (from memory); direction of change confirmed by ILSC2007 (read)",
      "confidence": "from memory",
      "note": "Continuous: 200*sqrt(625e-6) = 5, 200*sqrt(0.25) = 100."
    },
    "T1": {
      "band_nm": [
        302.5,
        315
      ],
      "expr": "10^(0.8*(lambda-295))*1e-15",
      "unit": "s",
      "source": "ICNIRP2013; IEC2014 (from memory); agrees with the EU tabulated crossover times (EU-FR Tab. 2.2, read) within 6.2 %, except 304 nm (-18 %, because the EU prints 60 instead of 63 J/m^2)",
      "confidence": "derived",
      "note": "UV crossover time: H = C1 for t <= T1, H = C2 for t > T1. T1 = 10 s at 315 nm."
    },
    "C1": {
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "source": "ICNIRP2013; IEC2014 (from memory); equals the EU 315-400 nm expression (EU-FR Tab. 2.2, read)",
      "confidence": "derived"
    },
    "C2": {
      "band_nm": [
        302.5,
        315
      ],
      "expr": "10^(0.2*(lambda-295))",
      "unit": "J/m^2",
      "source": "ICNIRP2013; IEC2014 (from memory); agrees with the EU tabulated 303-314 nm values (EU-FR Tab. 2.2, read) within 1 %, except 304 nm (-4.9 %)",
      "confidence": "derived"
    },
    "T_i": {
      "pieces": [
        {
          "band_nm": [
            400,
            1050
          ],
          "expr": "5e-6"
        },
        {
          "band_nm": [
            1050,
            1400
          ],
          "expr": "13e-6"
        },
        {
          "band_nm": [
            1400,
            1500
          ],
          "expr": "1e-3"
        },
        {
          "band_nm": [
            1500,
            1800
          ],
          "expr": "10"
        },
        {
          "band_nm": [
            1800,
            2600
          ],
          "expr": "1e-3"
        },
        {
          "band_nm": [
            2600,
            1000000.0
          ],
          "expr": "1e-7"
        }
      ],
      "unit": "s",
      "source": "ICNIRP2013; IEC2014 (from memory). 400-1400 nm values coincide with the new retinal breakpoints 5e-6 s and 1.3e-5 s; values above 1400 nm equal the EU Tmin (read).",
      "confidence": "from memory",
      "note": "Thermal confinement time: pulses inside one T_i are summed and counted as one pulse. No T_i is given for 180-400 nm (UV doses simply add)."
    }
  },
  "eye": [
    {
      "id": "H-E-UV-ps",
      "band_nm": [
        180,
        400
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "3e10",
      "unit": "W/m^2",
      "effect": "UV cornea/lens",
      "effectClass": "cornea-lens-unstated",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory, uncertain",
      "note": "Kept as in ICNIRP 1996/EU. Possible that ANSI Z136.1-2014 instead extends the radiant-exposure limits down to 1e-13 s; this row is the more restrictive reading, so it needs no conservative_alt."
    },
    {
      "id": "H-E-UV-180",
      "band_nm": [
        180,
        302.5
      ],
      "t_s": [
        1e-09,
        30000.0
      ],
      "quantity": "H",
      "expr": "30",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-E-UV-302a",
      "band_nm": [
        302.5,
        315
      ],
      "t_s": [
        1e-09,
        30000.0
      ],
      "quantity": "H",
      "expr": "C1",
      "unit": "J/m^2",
      "effect": "UV thermal cornea",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "derived",
      "when": "t <= T1",
      "note": "C1 = 5.6e3*t^0.25; T1 <= 10 s in this band so the row never reaches the t >= 10 s range."
    },
    {
      "id": "H-E-UV-302b",
      "band_nm": [
        302.5,
        315
      ],
      "t_s": [
        1e-09,
        30000.0
      ],
      "quantity": "H",
      "expr": "C2",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "derived",
      "when": "t > T1",
      "note": "C2 = 10^(0.2*(lambda-295)). ANSI writes the same as 'lower of photochemical 10^(200*(lambda_um-0.295))*1e-4 J/cm^2 and thermal 0.56*t^0.25 J/cm^2' (memory)."
    },
    {
      "id": "H-E-UVA",
      "band_nm": [
        315,
        400
      ],
      "t_s": [
        1e-09,
        10
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV-A cornea/lens",
      "effectClass": "cornea-lens-unstated",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-E-UVA-long",
      "band_nm": [
        315,
        400
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "1e4",
      "unit": "J/m^2",
      "effect": "UV-A lens (photochemical)",
      "effectClass": "cornea-lens-photochemical",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory, uncertain",
      "relaxed_alt": {
        "expr": "10*t",
        "when": "t > 1000",
        "source": "older ICNIRP / IEC 60825-1 editions: E = 10 W/m^2 from 1000 s (from memory)",
        "confidence": "from memory, uncertain"
      }
    },
    {
      "id": "H-E-VIS-1",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        1e-13,
        1e-11
      ],
      "quantity": "H",
      "expr": "1e-3*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory, uncertain",
      "conservative_alt": "1.5e-4*CE",
      "note": "ANSI2014 1.0e-7 J/cm^2 (memory); IEC2014 Class 1 AEL 3.9e-8*CE J over the 7 mm pupil gives the same 1e-3 J/m^2 (memory). Until verified use min(expr, conservative_alt) = old EU value."
    },
    {
      "id": "H-E-VIS-2",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        1e-11,
        1e-09
      ],
      "quantity": "H",
      "expr": "2e-3*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory, uncertain",
      "conservative_alt": "2.7e4*t^0.75*CE",
      "note": "Same plateau as the next row; alt = old EU expression for this range (lower below about 0.3 ns)."
    },
    {
      "id": "H-E-VIS-3",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        1e-09,
        5e-06
      ],
      "quantity": "H",
      "expr": "2e-3*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory",
      "note": "Lower (stricter) than the EU 5e-3 by a factor 2.5; direction confirmed by ILSC2007 (read). Continuous with 18*(5e-6)^0.75 = 1.90e-3."
    },
    {
      "id": "H-E-VIS-4",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        5e-06,
        10
      ],
      "quantity": "H",
      "expr": "18*t^0.75*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory",
      "note": "For alpha > 1.5 mrad continues up to T2."
    },
    {
      "id": "H-E-VIS-5p",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "10",
      "unit": "W/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "when": "alpha <= 1.5"
    },
    {
      "id": "H-E-VIS-5x",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "18*t^0.75*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t <= T2"
    },
    {
      "id": "H-E-VIS-6x",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "18*CE*T2^(-0.25)",
      "unit": "W/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t > T2"
    },
    {
      "id": "H-E-NIR1-1",
      "band_nm": [
        700,
        1050
      ],
      "t_s": [
        1e-13,
        1e-11
      ],
      "quantity": "H",
      "expr": "1e-3*CA*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory, uncertain",
      "conservative_alt": "1.5e-4*CA*CE",
      "note": "ANSI2014 1.0e-7 J/cm^2 (memory); IEC2014 Class 1 AEL 3.9e-8*CE J over the 7 mm pupil gives the same 1e-3 J/m^2 (memory). Until verified use min(expr, conservative_alt) = old EU value."
    },
    {
      "id": "H-E-NIR1-2",
      "band_nm": [
        700,
        1050
      ],
      "t_s": [
        1e-11,
        1e-09
      ],
      "quantity": "H",
      "expr": "2e-3*CA*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory, uncertain",
      "conservative_alt": "2.7e4*t^0.75*CA*CE",
      "note": "Same plateau as the next row; alt = old EU expression for this range (lower below about 0.3 ns)."
    },
    {
      "id": "H-E-NIR1-3",
      "band_nm": [
        700,
        1050
      ],
      "t_s": [
        1e-09,
        5e-06
      ],
      "quantity": "H",
      "expr": "2e-3*CA*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory",
      "note": "Lower (stricter) than the EU 5e-3 by a factor 2.5; direction confirmed by ILSC2007 (read). Continuous with 18*(5e-6)^0.75 = 1.90e-3."
    },
    {
      "id": "H-E-NIR1-4",
      "band_nm": [
        700,
        1050
      ],
      "t_s": [
        5e-06,
        10
      ],
      "quantity": "H",
      "expr": "18*t^0.75*CA*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory",
      "note": "For alpha > 1.5 mrad continues up to T2."
    },
    {
      "id": "H-E-NIR1-5p",
      "band_nm": [
        700,
        1050
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "10*CA",
      "unit": "W/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "when": "alpha <= 1.5"
    },
    {
      "id": "H-E-NIR1-5x",
      "band_nm": [
        700,
        1050
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "18*t^0.75*CA*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t <= T2",
      "max_E": {
        "value": "1000",
        "source": "EU 2006/25/EC Annex II Table 2.3 note: not to exceed 1000 W/m^2 (from memory), applied while unverified",
        "confidence": "from memory, uncertain",
        "conservativeOnly": true
      }
    },
    {
      "id": "H-E-NIR1-6x",
      "band_nm": [
        700,
        1050
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "18*CA*CE*T2^(-0.25)",
      "unit": "W/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t > T2",
      "max_E": {
        "value": "1000",
        "source": "EU 2006/25/EC Annex II Table 2.3 note: not to exceed 1000 W/m^2 (from memory), applied while unverified",
        "confidence": "from memory, uncertain",
        "conservativeOnly": true
      }
    },
    {
      "id": "H-E-NIR2-1",
      "band_nm": [
        1050,
        1400
      ],
      "t_s": [
        1e-13,
        1e-11
      ],
      "quantity": "H",
      "expr": "1e-2*CC*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory, uncertain",
      "conservative_alt": "1.5e-3*CC*CE",
      "note": "ANSI2014 1.0*CC*1e-6 J/cm^2 (memory)."
    },
    {
      "id": "H-E-NIR2-2",
      "band_nm": [
        1050,
        1400
      ],
      "t_s": [
        1e-11,
        1e-09
      ],
      "quantity": "H",
      "expr": "2e-2*CC*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory, uncertain",
      "conservative_alt": "2.7e5*t^0.75*CC*CE"
    },
    {
      "id": "H-E-NIR2-3",
      "band_nm": [
        1050,
        1400
      ],
      "t_s": [
        1e-09,
        1.3e-05
      ],
      "quantity": "H",
      "expr": "2e-2*CC*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory",
      "note": "EU: 5e-2 up to 5e-5 s. Continuous with 90*(1.3e-5)^0.75 = 1.95e-2."
    },
    {
      "id": "H-E-NIR2-4",
      "band_nm": [
        1050,
        1400
      ],
      "t_s": [
        1.3e-05,
        10
      ],
      "quantity": "H",
      "expr": "90*t^0.75*CC*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-E-NIR2-5p",
      "band_nm": [
        1050,
        1400
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "10*CA*CC",
      "unit": "W/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "when": "alpha <= 1.5"
    },
    {
      "id": "H-E-NIR2-5x",
      "band_nm": [
        1050,
        1400
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "90*t^0.75*CC*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t <= T2",
      "max_E": {
        "value": "1000",
        "source": "EU 2006/25/EC Annex II Table 2.3 note: not to exceed 1000 W/m^2 (from memory), applied while unverified",
        "confidence": "from memory, uncertain",
        "conservativeOnly": true
      }
    },
    {
      "id": "H-E-NIR2-6x",
      "band_nm": [
        1050,
        1400
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "18*CA*CC*CE*T2^(-0.25)",
      "unit": "W/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t > T2",
      "max_E": {
        "value": "1000",
        "source": "EU 2006/25/EC Annex II Table 2.3 note: not to exceed 1000 W/m^2 (from memory), applied while unverified",
        "confidence": "from memory, uncertain",
        "conservativeOnly": true
      }
    },
    {
      "id": "H-E-CORNEA-1200",
      "band_nm": [
        1200,
        1400
      ],
      "t_s": [
        1e-13,
        30000.0
      ],
      "quantity": "ref",
      "expr": "skin",
      "unit": "-",
      "effect": "cornea thermal (dual)",
      "effectClass": "cornea-lens-thermal",
      "source": "CORNEA2024 (read); ICNIRP2013",
      "confidence": "read",
      "note": "Dual limit: ICNIRP 2013 recommends using the skin limits (H-S rows, same band) for the cornea. Aperture for this check - OURS: 3.5 mm (skin aperture; stricter than 7 mm for small beams). ANSI Z136.1-2014 has its own corneal MPE for 1.2-1.4 um (values not reproduced; verify). The source discusses the need from about 1250 nm; OURS: apply from 1200 nm."
    },
    {
      "id": "H-E-PC-1",
      "band_nm": [
        400,
        600
      ],
      "t_s": [
        10,
        100
      ],
      "quantity": "H",
      "expr": "100*CB",
      "unit": "J/m^2",
      "effect": "retinal photochemical",
      "effectClass": "retina-photochemical",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "note": "gamma_p = 11 mrad. Dual limit: evaluate with thermal rows, use the lower."
    },
    {
      "id": "H-E-PC-2",
      "band_nm": [
        400,
        600
      ],
      "t_s": [
        100,
        30000.0
      ],
      "quantity": "E",
      "expr": "1*CB",
      "unit": "W/m^2",
      "effect": "retinal photochemical",
      "effectClass": "retina-photochemical",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "note": "gamma_p = 1.1*t^0.5 mrad (100-1e4 s), 110 mrad (1e4-3e4 s)."
    },
    {
      "id": "H-E-IR1400-ps",
      "band_nm": [
        1400,
        1500
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "H",
      "expr": "1e3",
      "unit": "J/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory, uncertain",
      "conservative_alt": "1e12*t",
      "note": "From memory the 2013/2014 documents extend the radiant-exposure plateau down to 1e-13 s (ANSI2014 '10^-13 to ...' rows). Older ICNIRP/EU: irradiance cap (conservative_alt, written as H = E*t). Until verified use min()."
    },
    {
      "id": "H-E-IR1400-1",
      "band_nm": [
        1400,
        1500
      ],
      "t_s": [
        1e-09,
        0.001
      ],
      "quantity": "H",
      "expr": "1e3",
      "unit": "J/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-E-IR1400-2",
      "band_nm": [
        1400,
        1500
      ],
      "t_s": [
        0.001,
        10
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-E-IR1400-long",
      "band_nm": [
        1400,
        1500
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "1e3",
      "unit": "W/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "note": "IEC/ANSI (memory): for t > 10 s and irradiated area > 0.01 m^2 (skin) the limit is reduced, see large-area note in the .md."
    },
    {
      "id": "H-E-IR1500-ps",
      "band_nm": [
        1500,
        1800
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "H",
      "expr": "1e4",
      "unit": "J/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory, uncertain",
      "conservative_alt": "1e13*t",
      "note": "From memory the 2013/2014 documents extend the radiant-exposure plateau down to 1e-13 s (ANSI2014 '10^-13 to ...' rows). Older ICNIRP/EU: irradiance cap (conservative_alt, written as H = E*t). Until verified use min()."
    },
    {
      "id": "H-E-IR1500-1",
      "band_nm": [
        1500,
        1800
      ],
      "t_s": [
        1e-09,
        10
      ],
      "quantity": "H",
      "expr": "1e4",
      "unit": "J/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-E-IR1500-long",
      "band_nm": [
        1500,
        1800
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "1e3",
      "unit": "W/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "note": "IEC/ANSI (memory): for t > 10 s and irradiated area > 0.01 m^2 (skin) the limit is reduced, see large-area note in the .md."
    },
    {
      "id": "H-E-IR1800-ps",
      "band_nm": [
        1800,
        2600
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "H",
      "expr": "1e3",
      "unit": "J/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory, uncertain",
      "conservative_alt": "1e12*t",
      "note": "From memory the 2013/2014 documents extend the radiant-exposure plateau down to 1e-13 s (ANSI2014 '10^-13 to ...' rows). Older ICNIRP/EU: irradiance cap (conservative_alt, written as H = E*t). Until verified use min()."
    },
    {
      "id": "H-E-IR1800-1",
      "band_nm": [
        1800,
        2600
      ],
      "t_s": [
        1e-09,
        0.001
      ],
      "quantity": "H",
      "expr": "1e3",
      "unit": "J/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-E-IR1800-2",
      "band_nm": [
        1800,
        2600
      ],
      "t_s": [
        0.001,
        10
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-E-IR1800-long",
      "band_nm": [
        1800,
        2600
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "1e3",
      "unit": "W/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "note": "IEC/ANSI (memory): for t > 10 s and irradiated area > 0.01 m^2 (skin) the limit is reduced, see large-area note in the .md."
    },
    {
      "id": "H-E-IR2600-ps",
      "band_nm": [
        2600,
        1000000.0
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "H",
      "expr": "100",
      "unit": "J/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory)",
      "confidence": "from memory, uncertain",
      "conservative_alt": "1e11*t",
      "note": "From memory the 2013/2014 documents extend the radiant-exposure plateau down to 1e-13 s (ANSI2014 '10^-13 to ...' rows). Older ICNIRP/EU: irradiance cap (conservative_alt, written as H = E*t). Until verified use min()."
    },
    {
      "id": "H-E-IR2600-1",
      "band_nm": [
        2600,
        1000000.0
      ],
      "t_s": [
        1e-09,
        1e-07
      ],
      "quantity": "H",
      "expr": "100",
      "unit": "J/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-E-IR2600-2",
      "band_nm": [
        2600,
        1000000.0
      ],
      "t_s": [
        1e-07,
        10
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-E-IR2600-long",
      "band_nm": [
        2600,
        1000000.0
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "1e3",
      "unit": "W/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A; ANSI2014 Tab. 5a (all from memory); same as EU Tab. 2.3 (from memory)",
      "confidence": "from memory",
      "note": "IEC/ANSI (memory): for t > 10 s and irradiated area > 0.01 m^2 (skin) the limit is reduced, see large-area note in the .md."
    }
  ],
  "skin": [
    {
      "id": "H-S-UV-ps",
      "band_nm": [
        180,
        400
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "3e10",
      "unit": "W/m^2",
      "effect": "skin UV",
      "effectClass": "skin-unstated",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory, uncertain"
    },
    {
      "id": "H-S-UV",
      "band_nm": [
        180,
        400
      ],
      "t_s": [
        1e-09,
        30000.0
      ],
      "quantity": "ref",
      "expr": "eye",
      "unit": "-",
      "effect": "skin UV",
      "effectClass": "skin-unstated",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory)",
      "confidence": "from memory",
      "note": "Same values as the eye UV rows (H-E-UV-*), skin aperture 3.5 mm; exception below for 315-400 nm beyond 1e3 s."
    },
    {
      "id": "H-S-UVA-long",
      "band_nm": [
        315,
        400
      ],
      "t_s": [
        1000.0,
        30000.0
      ],
      "quantity": "E",
      "expr": "10",
      "unit": "W/m^2",
      "effect": "skin UV-A",
      "effectClass": "skin-unstated",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory)",
      "confidence": "from memory, uncertain",
      "conservative_alt": "1e4/t",
      "note": "From memory the IEC skin table and ANSI Tab. 7 give 10 W/m^2 (1 mW/cm^2) for UV-A skin exposure 1e3-3e4 s; the eye limit (H = 1e4 J/m^2 total) is the conservative_alt. EU: 'see eye limits'."
    },
    {
      "id": "H-S-400-ps",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "2e11",
      "unit": "W/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory, uncertain",
      "note": "Sub-nanosecond skin limits not verified for ICNIRP 2013; kept as EU (read)."
    },
    {
      "id": "H-S-400-1",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        1e-09,
        1e-07
      ],
      "quantity": "H",
      "expr": "200*CA",
      "unit": "J/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-S-400-2",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        1e-07,
        10
      ],
      "quantity": "H",
      "expr": "1.1e4*CA*t^0.25",
      "unit": "J/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-S-400-3",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "2e3*CA",
      "unit": "W/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-S-700-ps",
      "band_nm": [
        700,
        1400
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "2e11*CA",
      "unit": "W/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory, uncertain",
      "note": "Sub-nanosecond skin limits not verified for ICNIRP 2013; kept as EU (read)."
    },
    {
      "id": "H-S-700-1",
      "band_nm": [
        700,
        1400
      ],
      "t_s": [
        1e-09,
        1e-07
      ],
      "quantity": "H",
      "expr": "200*CA",
      "unit": "J/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-S-700-2",
      "band_nm": [
        700,
        1400
      ],
      "t_s": [
        1e-07,
        10
      ],
      "quantity": "H",
      "expr": "1.1e4*CA*t^0.25",
      "unit": "J/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-S-700-3",
      "band_nm": [
        700,
        1400
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "E",
      "expr": "2e3*CA",
      "unit": "W/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory); same value as EU Tab. 2.2/2.4 (EU-FR, read)",
      "confidence": "from memory"
    },
    {
      "id": "H-S-IR",
      "band_nm": [
        1400,
        1000000.0
      ],
      "t_s": [
        1e-13,
        30000.0
      ],
      "quantity": "ref",
      "expr": "eye",
      "unit": "-",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "ICNIRP2013; IEC2014 Annex A skin table; ANSI2014 Tab. 7 (all from memory)",
      "confidence": "from memory",
      "note": "Same values as the eye far-IR rows (H-E-IR*), including their conservative_alt below 1 ns; skin aperture 3.5 mm (11 mm above 1e5 nm)."
    }
  ],
  "apertures": {
    "eye": [
      {
        "band_nm": [
          180,
          400
        ],
        "t_s": [
          1e-13,
          0.35
        ],
        "diameter_mm": "1",
        "source": "IEC2014 Annex A aperture table (from memory)",
        "confidence": "from memory, uncertain"
      },
      {
        "band_nm": [
          180,
          400
        ],
        "t_s": [
          0.35,
          10
        ],
        "diameter_mm": "1.5*t^0.375",
        "source": "IEC2014 Annex A aperture table (from memory)",
        "confidence": "from memory, uncertain",
        "conservative_alt": "1"
      },
      {
        "band_nm": [
          180,
          400
        ],
        "t_s": [
          10,
          30000.0
        ],
        "diameter_mm": "3.5",
        "source": "IEC2014 Annex A aperture table (from memory)",
        "confidence": "from memory, uncertain",
        "conservative_alt": "1"
      },
      {
        "band_nm": [
          400,
          1400
        ],
        "t_s": [
          1e-13,
          30000.0
        ],
        "diameter_mm": "7",
        "source": "IEC2014; ICNIRP2013; ANSI2014 (from memory); same as EU Tab. 2.2 (read)",
        "confidence": "from memory"
      },
      {
        "band_nm": [
          1400,
          100000.0
        ],
        "t_s": [
          1e-13,
          0.35
        ],
        "diameter_mm": "1",
        "source": "IEC2014 Annex A aperture table (from memory); BGVB2 Tab. 5 (read, older IEC edition)",
        "confidence": "from memory"
      },
      {
        "band_nm": [
          1400,
          100000.0
        ],
        "t_s": [
          0.35,
          10
        ],
        "diameter_mm": "1.5*t^0.375",
        "source": "IEC2014 Annex A aperture table (from memory); BGVB2 Tab. 5 (read)",
        "confidence": "from memory"
      },
      {
        "band_nm": [
          1400,
          100000.0
        ],
        "t_s": [
          10,
          30000.0
        ],
        "diameter_mm": "3.5",
        "source": "IEC2014 Annex A aperture table (from memory); BGVB2 Tab. 5 (read)",
        "confidence": "from memory"
      },
      {
        "band_nm": [
          100000.0,
          1000000.0
        ],
        "t_s": [
          1e-13,
          30000.0
        ],
        "diameter_mm": "11",
        "source": "IEC2014 Annex A aperture table (from memory); BGVB2 Tab. 5 (read)",
        "confidence": "from memory"
      }
    ],
    "skin": [
      {
        "band_nm": [
          180,
          100000.0
        ],
        "t_s": [
          1e-13,
          30000.0
        ],
        "diameter_mm": "3.5",
        "source": "IEC2014 Annex A aperture table (from memory); BGVB2 Tab. 5 (read)",
        "confidence": "from memory"
      },
      {
        "band_nm": [
          100000.0,
          1000000.0
        ],
        "t_s": [
          1e-13,
          30000.0
        ],
        "diameter_mm": "11",
        "source": "IEC2014 Annex A aperture table (from memory); BGVB2 Tab. 5 (read)",
        "confidence": "from memory"
      }
    ],
    "note": "IEC uses 0.35 s as the switch (1.5*0.35^0.375 = 1.01 mm, continuous). ICNIRP and ANSI write 0.3 s (memory), as the EU does. UV eye aperture: older IEC editions (and BGVB2, read) use 1 mm at all durations; the 3.5 mm at t >= 10 s for UV is from memory of the 2014 edition - conservative_alt keeps 1 mm."
  },
  "repetitivePulses": {
    "rules": [
      {
        "n": 1,
        "text": "Single-pulse limit for every pulse (all wavelengths).",
        "cite": "ICNIRP2013; IEC2014 4.3 f) rule 1 (from memory)",
        "source": "ICNIRP2013; IEC2014 4.3 f); ANSI2014 (from memory)",
        "confidence": "from memory"
      },
      {
        "n": 2,
        "text": "Average-power (total-dose) limit: the exposure of the train (or any sub-group) over its duration T must not exceed the limit for T. For 400-1400 nm T need not exceed T2; beyond 1400 nm 10 s.",
        "cite": "ICNIRP2013; IEC2014 4.3 f) rule 2 (from memory)",
        "source": "ICNIRP2013; IEC2014; ANSI2014 (from memory)",
        "confidence": "from memory"
      },
      {
        "n": 3,
        "text": "Retinal thermal limits only (400-1400 nm): per-pulse limit = single-pulse limit * CP. Not applied to cornea/skin limits.",
        "source": "ILSC2019 (read) for the scope; factor values memory",
        "confidence": "read"
      }
    ],
    "cp": {
      "expr": "N^(-0.25)",
      "pieces": [
        {
          "when": "alpha <= 5",
          "expr": "1"
        },
        {
          "when": "5 < alpha and alpha <= alpha_max and N <= 40",
          "expr": "N^(-0.25)"
        },
        {
          "when": "5 < alpha and alpha <= alpha_max and N > 40",
          "expr": "0.4"
        },
        {
          "when": "alpha > alpha_max and N <= 625",
          "expr": "N^(-0.25)"
        },
        {
          "when": "alpha > alpha_max and N > 625",
          "expr": "0.2"
        }
      ],
      "conservative_alt": "N^(-0.25)",
      "appliesTo": ["retina-thermal"],
      "scopeNote": "C_P applies only to retinal thermal limits (400-1400 nm, eye); ILSC2019 (read)",
      "pulsesShorterThan_s": "0.25",
      "source": "IEC2014 4.3 f) 3) C5; ICNIRP2013 CP (from memory)",
      "confidence": "from memory, uncertain",
      "note": "Applies to pulse durations < 0.25 s; N counted within min(T, T2); pulses within T_i counted as one. conservative_alt is the EU form (no alpha dependence, no cap on N). Until verified, use CP = N^(-0.25) for every alpha and N: it is never larger than the piecewise form, hence never less protective. Scope (retinal thermal only): ILSC2019 (read)."
    },
    "grouping": {
      "factor": "T_i",
      "edgeSide": "upper",
      "source": "ICNIRP2013; IEC2014 4.3 f) (from memory): pulses inside T_i are summed and counted as one; no T_i below 400 nm (UV doses simply add, rule 2)",
      "confidence": "from memory"
    },
    "countingWindows": [
      {
        "band_nm": [180, 400],
        "source": "ICNIRP2013; IEC2014 4.3 f) (from memory): no T2 below 400 nm",
        "confidence": "from memory"
      },
      {
        "band_nm": [400, 1400],
        "cap": { "factor": "T2" },
        "source": "ICNIRP2013; IEC2014 4.3 f) (from memory): N within min(T, T2)",
        "confidence": "from memory"
      },
      {
        "band_nm": [1400, 1000000.0],
        "cap": { "seconds": "10", "label": "above 1400 nm" },
        "source": "ICNIRP2013; IEC2014 4.3 f) (from memory): beyond 1400 nm 10 s",
        "confidence": "from memory"
      }
    ],
    "notes": [
      {
        "text": "ANSI Z136.1-2014 also restricts CP to retinal thermal exposure; its caps on n and the handling of n within T_i may differ from IEC - not reproduced (memory, unverified).",
        "source": "ANSI2014 (from memory)",
        "confidence": "from memory, uncertain"
      }
    ]
  }
};
