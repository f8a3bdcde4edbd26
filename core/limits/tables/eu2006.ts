// Exposure-limit table for the rule set 'eu2006' (EU Directive 2006/25/EC, Annex II (laser optical radiation)).
// DATA, not logic: each row carries its band, duration range, quantity, expression, source and
// confidence exactly as in the project's limit specification (exposure-limits spec, schema
// version 1.0). The engine in ../exposure-limit.ts evaluates these rows; nothing
// here is computed. Source keys are explained in ./sources.ts.
// Generated once from the specification's JSON and reviewed by hand; edit rows here, with a source.
import type { RuleSetTable } from '../table-types.js';

export const EU2006_TABLE: RuleSetTable = {
  "id": "eu2006",
  "specKey": "EU_2006-25-EC_AnnexII",
  "title": "EU Directive 2006/25/EC, Annex II (laser optical radiation)",
  "status": "Tables 2.1, 2.2, 2.4, 2.5, 2.6 read (French transposition, same numbers); Table 2.3 (eye, t >= 10 s) from memory.",
  "factors": {
    "CA": {
      "pieces": [
        {
          "band_nm": [
            180,
            700
          ],
          "expr": "1",
          "source": "EU-FR Tableau 2.5; EU-NO Table 4.5",
          "confidence": "read"
        },
        {
          "band_nm": [
            700,
            1050
          ],
          "expr": "10^(0.002*(lambda-700))",
          "source": "EU-FR Tableau 2.5; EU-NO Table 4.5",
          "confidence": "read"
        },
        {
          "band_nm": [
            1050,
            1400
          ],
          "expr": "5",
          "source": "EU-FR Tableau 2.5; EU-NO Table 4.5",
          "confidence": "read"
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
          "source": "EU-FR Tableau 2.5; EU-NO Table 4.5",
          "confidence": "read"
        },
        {
          "band_nm": [
            450,
            700
          ],
          "expr": "10^(0.02*(lambda-450))",
          "source": "EU-FR Tableau 2.5; EU-NO Table 4.5",
          "confidence": "read"
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
      "source": "EU-FR Tableau 2.5; EU-NO Table 4.5",
      "confidence": "read",
      "note": "alpha_max = 100 mrad (fixed)."
    },
    "alpha_min": {
      "value": 1.5,
      "unit": "mrad",
      "source": "EU-FR Tableau 2.5",
      "confidence": "read"
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
      "source": "EU-FR Tableau 2.5; EU-NO Table 4.5",
      "confidence": "read",
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
      "source": "EU-FR Tableau 2.5 (symbol gamma); EU-NO Table 4.5; BGVB2",
      "confidence": "read",
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
          "source": "EU-FR Tableau 2.5",
          "confidence": "read"
        },
        {
          "band_nm": [
            1150,
            1200
          ],
          "expr": "10^(0.018*(lambda-1150))",
          "source": "EU-FR Tableau 2.5",
          "confidence": "read"
        },
        {
          "band_nm": [
            1200,
            1400
          ],
          "expr": "8",
          "source": "EU-FR Tableau 2.5",
          "confidence": "read"
        }
      ],
      "note": "Retinal thermal factor for 1150-1400 nm (IEC symbol C7)."
    },
    "alpha_max": {
      "value": 100,
      "unit": "mrad",
      "source": "EU-FR Tableau 2.5 (in the CE row)",
      "confidence": "read"
    },
    "T1_vis": {
      "pieces": [
        {
          "band_nm": [
            400,
            450
          ],
          "expr": "10"
        },
        {
          "band_nm": [
            450,
            500
          ],
          "expr": "10*10^(0.02*(lambda-450))"
        },
        {
          "band_nm": [
            500,
            600
          ],
          "expr": "100"
        }
      ],
      "unit": "s",
      "source": "EU-FR Tableau 2.5 (named T1 there); EU-NO Table 4.5",
      "confidence": "read",
      "note": "NAME CLASH: in the Directive 'T1' is the photochemical/thermal crossover time for small visible sources (a note to Table 2.3, memory: thermal limit for 10 s <= t < T1, photochemical for longer). ICNIRP/IEC use T1 for the UV crossover. Implementations shall not use T1_vis to switch limits: evaluate both visible limits and take the lower (equivalent for 400-500 nm, and the only safe reading for 500-600 nm)."
    },
    "T_min": {
      "pieces": [
        {
          "band_nm": [
            315,
            400
          ],
          "expr": "1e-9"
        },
        {
          "band_nm": [
            400,
            1050
          ],
          "expr": "18e-6"
        },
        {
          "band_nm": [
            1050,
            1400
          ],
          "expr": "50e-6"
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
      "source": "EU-FR Tableau 2.6; EU-CONS Table 2.6",
      "confidence": "read",
      "note": "Pulses delivered within Tmin are treated as one pulse for rule 3. The Directive lists band edges as lo < lambda <= hi."
    },
    "UV_302_315": {
      "note": "The Directive does not use C1/C2/T1 formulas; Tableau 2.2 tabulates one value per integer wavelength 303..314 nm with the time below which H = 5.6e3*t^0.25 applies. The printed values agree with 10^(0.2*(lambda-295)) within 1 % except 304 nm (60 printed, formula 63.1). Each printed time is where 5.6e3*t^0.25 reaches the printed value; these agree with 10^(0.8*(lambda-295))*1e-15 s within 6.2 % except 304 nm (1.3e-8 vs 1.58e-8 s).",
      "source": "EU-FR Tableau 2.2 (read); formula identity 'derived'"
    }
  },
  "eye": [
    {
      "id": "EU-E-UV-ps",
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
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Note c of Table 2.2: equals the 1 ns radiant-exposure limit (3e10 W/m^2 * 1e-9 s = 30 J/m^2)."
    },
    {
      "id": "EU-E-UV-180-303",
      "band_nm": [
        180,
        303
      ],
      "t_s": [
        1e-09,
        10
      ],
      "quantity": "H",
      "expr": "30",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Directive rows 'UVC 180-280' and 'UVB 280-302'. 302 < lambda < 303 is not listed; OURS: use the 302 nm row (the more restrictive neighbour)."
    },
    {
      "id": "EU-E-UV-180-303-long",
      "band_nm": [
        180,
        303
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "30",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-303-a",
      "band_nm": [
        303,
        304
      ],
      "t_s": [
        1e-09,
        2.6e-09
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '303' nm: 'if t < 2.6e-09 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-303-b",
      "band_nm": [
        303,
        304
      ],
      "t_s": [
        2.6e-09,
        10
      ],
      "quantity": "H",
      "expr": "40",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-303-long",
      "band_nm": [
        303,
        304
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "40",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-304-a",
      "band_nm": [
        304,
        305
      ],
      "t_s": [
        1e-09,
        1.3e-08
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '304' nm: 'if t < 1.3e-08 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-304-b",
      "band_nm": [
        304,
        305
      ],
      "t_s": [
        1.3e-08,
        10
      ],
      "quantity": "H",
      "expr": "60",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-304-long",
      "band_nm": [
        304,
        305
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "60",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-305-a",
      "band_nm": [
        305,
        306
      ],
      "t_s": [
        1e-09,
        1e-07
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '305' nm: 'if t < 1e-07 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-305-b",
      "band_nm": [
        305,
        306
      ],
      "t_s": [
        1e-07,
        10
      ],
      "quantity": "H",
      "expr": "100",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-305-long",
      "band_nm": [
        305,
        306
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "100",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-306-a",
      "band_nm": [
        306,
        307
      ],
      "t_s": [
        1e-09,
        6.7e-07
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '306' nm: 'if t < 6.7e-07 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-306-b",
      "band_nm": [
        306,
        307
      ],
      "t_s": [
        6.7e-07,
        10
      ],
      "quantity": "H",
      "expr": "160",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-306-long",
      "band_nm": [
        306,
        307
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "160",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-307-a",
      "band_nm": [
        307,
        308
      ],
      "t_s": [
        1e-09,
        4e-06
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '307' nm: 'if t < 4e-06 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-307-b",
      "band_nm": [
        307,
        308
      ],
      "t_s": [
        4e-06,
        10
      ],
      "quantity": "H",
      "expr": "250",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-307-long",
      "band_nm": [
        307,
        308
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "250",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-308-a",
      "band_nm": [
        308,
        309
      ],
      "t_s": [
        1e-09,
        2.6e-05
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '308' nm: 'if t < 2.6e-05 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-308-b",
      "band_nm": [
        308,
        309
      ],
      "t_s": [
        2.6e-05,
        10
      ],
      "quantity": "H",
      "expr": "400",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-308-long",
      "band_nm": [
        308,
        309
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "400",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-309-a",
      "band_nm": [
        309,
        310
      ],
      "t_s": [
        1e-09,
        0.00016
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '309' nm: 'if t < 0.00016 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-309-b",
      "band_nm": [
        309,
        310
      ],
      "t_s": [
        0.00016,
        10
      ],
      "quantity": "H",
      "expr": "630",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-309-long",
      "band_nm": [
        309,
        310
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "630",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-310-a",
      "band_nm": [
        310,
        311
      ],
      "t_s": [
        1e-09,
        0.001
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '310' nm: 'if t < 0.001 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-310-b",
      "band_nm": [
        310,
        311
      ],
      "t_s": [
        0.001,
        10
      ],
      "quantity": "H",
      "expr": "1000",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-310-long",
      "band_nm": [
        310,
        311
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "1000",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-311-a",
      "band_nm": [
        311,
        312
      ],
      "t_s": [
        1e-09,
        0.0067
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '311' nm: 'if t < 0.0067 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-311-b",
      "band_nm": [
        311,
        312
      ],
      "t_s": [
        0.0067,
        10
      ],
      "quantity": "H",
      "expr": "1600",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-311-long",
      "band_nm": [
        311,
        312
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "1600",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-312-a",
      "band_nm": [
        312,
        313
      ],
      "t_s": [
        1e-09,
        0.04
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '312' nm: 'if t < 0.04 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-312-b",
      "band_nm": [
        312,
        313
      ],
      "t_s": [
        0.04,
        10
      ],
      "quantity": "H",
      "expr": "2500",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-312-long",
      "band_nm": [
        312,
        313
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "2500",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-313-a",
      "band_nm": [
        313,
        314
      ],
      "t_s": [
        1e-09,
        0.26
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '313' nm: 'if t < 0.26 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-313-b",
      "band_nm": [
        313,
        314
      ],
      "t_s": [
        0.26,
        10
      ],
      "quantity": "H",
      "expr": "4000",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-313-long",
      "band_nm": [
        313,
        314
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "4000",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UV-314-a",
      "band_nm": [
        314,
        315
      ],
      "t_s": [
        1e-09,
        1.6
      ],
      "quantity": "H",
      "expr": "5.6e3*t^0.25",
      "unit": "J/m^2",
      "effect": "UV thermal/photochemical cornea",
      "effectClass": "cornea-lens-thermal-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read",
      "note": "Tabulated row '314' nm: 'if t < 1.6 s then H = 5.6e3 t^0.25'. OURS: non-integer wavelengths use the row of floor(lambda)."
    },
    {
      "id": "EU-E-UV-314-b",
      "band_nm": [
        314,
        315
      ],
      "t_s": [
        1.6,
        10
      ],
      "quantity": "H",
      "expr": "6300",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UV-314-long",
      "band_nm": [
        314,
        315
      ],
      "t_s": [
        10,
        30000.0
      ],
      "quantity": "H",
      "expr": "6300",
      "unit": "J/m^2",
      "effect": "UV photochemical cornea",
      "effectClass": "cornea-lens-photochemical",
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-UVA",
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
      "source": "EU-FR Tableau 2.2",
      "confidence": "read"
    },
    {
      "id": "EU-E-UVA-long",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-VIS-1",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        1e-13,
        1e-11
      ],
      "quantity": "H",
      "expr": "1.5e-4*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-VIS-2",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        1e-11,
        1e-09
      ],
      "quantity": "H",
      "expr": "2.7e4*t^0.75*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-VIS-3",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        1e-09,
        1.8e-05
      ],
      "quantity": "H",
      "expr": "5e-3*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-VIS-4",
      "band_nm": [
        400,
        700
      ],
      "t_s": [
        1.8e-05,
        10
      ],
      "quantity": "H",
      "expr": "18*t^0.75*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read",
      "note": "For an extended source (alpha > 1.5 mrad) this expression continues up to T2 (Table 2.3, memory)."
    },
    {
      "id": "EU-E-VIS-5p",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory",
      "when": "alpha <= 1.5",
      "note": "Small source. Continuous with the t < 10 s row (18*10^0.75/10 = 10.1 W/m^2)."
    },
    {
      "id": "EU-E-VIS-5x",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t <= T2"
    },
    {
      "id": "EU-E-VIS-6x",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t > T2"
    },
    {
      "id": "EU-E-NIR1-1",
      "band_nm": [
        700,
        1050
      ],
      "t_s": [
        1e-13,
        1e-11
      ],
      "quantity": "H",
      "expr": "1.5e-4*CA*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-NIR1-2",
      "band_nm": [
        700,
        1050
      ],
      "t_s": [
        1e-11,
        1e-09
      ],
      "quantity": "H",
      "expr": "2.7e4*t^0.75*CA*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-NIR1-3",
      "band_nm": [
        700,
        1050
      ],
      "t_s": [
        1e-09,
        1.8e-05
      ],
      "quantity": "H",
      "expr": "5e-3*CA*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-NIR1-4",
      "band_nm": [
        700,
        1050
      ],
      "t_s": [
        1.8e-05,
        10
      ],
      "quantity": "H",
      "expr": "18*t^0.75*CA*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read",
      "note": "For an extended source (alpha > 1.5 mrad) this expression continues up to T2 (Table 2.3, memory)."
    },
    {
      "id": "EU-E-NIR1-5p",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory",
      "when": "alpha <= 1.5",
      "note": "Small source. Continuous with the t < 10 s row (18*10^0.75/10 = 10.1 W/m^2)."
    },
    {
      "id": "EU-E-NIR1-5x",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t <= T2",
      "max_E": {
        "value": "1000",
        "source": "EU 2006/25/EC Annex II Table 2.3 note: not to exceed 1000 W/m^2 (from memory)",
        "confidence": "from memory"
      },
      "note": "For 700-1400 nm Table 2.3 adds 'not to exceed 1000 W/m^2' (memory); the limit as mean irradiance H/t is capped from 10 s to T2 as well as after T2."
    },
    {
      "id": "EU-E-NIR1-6x",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t > T2",
      "max_E": {
        "value": "1000",
        "source": "EU 2006/25/EC Annex II Table 2.3 note: not to exceed 1000 W/m^2 (from memory)",
        "confidence": "from memory"
      },
      "note": "For 700-1400 nm Table 2.3 adds 'not to exceed 1000 W/m^2' (memory)."
    },
    {
      "id": "EU-E-NIR2-1",
      "band_nm": [
        1050,
        1400
      ],
      "t_s": [
        1e-13,
        1e-11
      ],
      "quantity": "H",
      "expr": "1.5e-3*CC*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-NIR2-2",
      "band_nm": [
        1050,
        1400
      ],
      "t_s": [
        1e-11,
        1e-09
      ],
      "quantity": "H",
      "expr": "2.7e5*t^0.75*CC*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-NIR2-3",
      "band_nm": [
        1050,
        1400
      ],
      "t_s": [
        1e-09,
        5e-05
      ],
      "quantity": "H",
      "expr": "5e-2*CC*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-NIR2-4",
      "band_nm": [
        1050,
        1400
      ],
      "t_s": [
        5e-05,
        10
      ],
      "quantity": "H",
      "expr": "90*t^0.75*CC*CE",
      "unit": "J/m^2",
      "effect": "retinal thermal",
      "effectClass": "retina-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read",
      "note": "90 = 18*CA with CA = 5 already folded in."
    },
    {
      "id": "EU-E-NIR2-5p",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory",
      "when": "alpha <= 1.5",
      "note": "= 50*CC W/m^2; continuous with 90*10^0.75/10 = 50.6*CC."
    },
    {
      "id": "EU-E-NIR2-5x",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t <= T2",
      "max_E": {
        "value": "1000",
        "source": "EU 2006/25/EC Annex II Table 2.3 note: not to exceed 1000 W/m^2 (from memory)",
        "confidence": "from memory"
      },
      "note": "For 700-1400 nm Table 2.3 adds 'not to exceed 1000 W/m^2' (memory); the limit as mean irradiance H/t is capped from 10 s to T2 as well as after T2."
    },
    {
      "id": "EU-E-NIR2-6x",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory",
      "when": "alpha > 1.5 and t > T2",
      "max_E": {
        "value": "1000",
        "source": "EU 2006/25/EC Annex II Table 2.3 note: not to exceed 1000 W/m^2 (from memory)",
        "confidence": "from memory"
      },
      "note": "Table 2.3 adds 'not to exceed 1000 W/m^2' (memory)."
    },
    {
      "id": "EU-E-PC-1",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory",
      "note": "Measured with field of view gamma_p = 11 mrad. Dual limit with the thermal rows: both apply, use the lower."
    },
    {
      "id": "EU-E-PC-2",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory",
      "note": "gamma_p = 1.1*t^0.5 mrad up to 1e4 s, 110 mrad above. Radiance form (memory): G = 1e6*CB J m^-2 sr^-1 for 10 s-1e4 s, L = 100*CB W m^-2 sr^-1 above 1e4 s; the irradiance values follow from the solid angle of gamma_p (derived)."
    },
    {
      "id": "EU-E-IR1400-ps",
      "band_nm": [
        1400,
        1500
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "1e12",
      "unit": "W/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-IR1400-1",
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
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-IR1400-2",
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
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-IR1400-long",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-IR1500-ps",
      "band_nm": [
        1500,
        1800
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "1e13",
      "unit": "W/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-IR1500-1",
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
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-IR1500-long",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-IR1800-ps",
      "band_nm": [
        1800,
        2600
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "1e12",
      "unit": "W/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-IR1800-1",
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
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-IR1800-2",
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
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-IR1800-long",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    },
    {
      "id": "EU-E-IR2600-ps",
      "band_nm": [
        2600,
        1000000.0
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "1e11",
      "unit": "W/m^2",
      "effect": "cornea thermal",
      "effectClass": "cornea-lens-thermal",
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-IR2600-1",
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
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read"
    },
    {
      "id": "EU-E-IR2600-2",
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
      "source": "EU-FR Tableau 2.2; BGI832 Tab. 6a",
      "confidence": "read",
      "note": "The French copy prints '5,6.10^3.t' (exponent lost); the Directive, BGI832 Tab. 6a and continuity at 1e-7 s (99.6 vs 100) give t^0.25."
    },
    {
      "id": "EU-E-IR2600-long",
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
      "source": "EU-2.3-MEM",
      "confidence": "from memory"
    }
  ],
  "skin": [
    {
      "id": "EU-S-UV-ps",
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
      "source": "EU-FR Tableau 2.4",
      "confidence": "read"
    },
    {
      "id": "EU-S-UV",
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
      "source": "EU-FR Tableau 2.4",
      "confidence": "read",
      "note": "Table 2.4 says 'see eye exposure limits': use the EU eye UV rows (H = 30, tabulated 303-314 nm values, 5.6e3*t^0.25, 1e4) with the skin aperture 3.5 mm."
    },
    {
      "id": "EU-S-400-ps",
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
      "source": "EU-FR Tableau 2.4",
      "confidence": "read"
    },
    {
      "id": "EU-S-400-1",
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
      "source": "EU-FR Tableau 2.4",
      "confidence": "read"
    },
    {
      "id": "EU-S-400-2",
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
      "source": "EU-FR Tableau 2.4",
      "confidence": "read",
      "note": "The HTML layout of the French copy splits the 1e-3..10 s column; the published boundary is 10 s (continuity: 1.1e4*10^0.25 = 19 561 J/m^2 vs 2e3*10 = 20 000 J/m^2)."
    },
    {
      "id": "EU-S-400-3",
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
      "source": "EU-FR Tableau 2.4",
      "confidence": "read"
    },
    {
      "id": "EU-S-700-ps",
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
      "source": "EU-FR Tableau 2.4",
      "confidence": "read"
    },
    {
      "id": "EU-S-700-1",
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
      "source": "EU-FR Tableau 2.4",
      "confidence": "read"
    },
    {
      "id": "EU-S-700-2",
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
      "source": "EU-FR Tableau 2.4",
      "confidence": "read",
      "note": "The HTML layout of the French copy splits the 1e-3..10 s column; the published boundary is 10 s (continuity: 1.1e4*10^0.25 = 19 561 J/m^2 vs 2e3*10 = 20 000 J/m^2)."
    },
    {
      "id": "EU-S-700-3",
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
      "source": "EU-FR Tableau 2.4",
      "confidence": "read"
    },
    {
      "id": "EU-S-IR1400-ps",
      "band_nm": [
        1400,
        1500
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "1e12",
      "unit": "W/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "EU-FR Tableau 2.4",
      "confidence": "read"
    },
    {
      "id": "EU-S-IR1400",
      "band_nm": [
        1400,
        1500
      ],
      "t_s": [
        1e-09,
        30000.0
      ],
      "quantity": "ref",
      "expr": "eye",
      "unit": "-",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "EU-FR Tableau 2.4",
      "confidence": "read",
      "note": "Table 2.4: 'see eye exposure limits' (eye rows for the same band, skin aperture)."
    },
    {
      "id": "EU-S-IR1500-ps",
      "band_nm": [
        1500,
        1800
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "1e13",
      "unit": "W/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "EU-FR Tableau 2.4",
      "confidence": "read"
    },
    {
      "id": "EU-S-IR1500",
      "band_nm": [
        1500,
        1800
      ],
      "t_s": [
        1e-09,
        30000.0
      ],
      "quantity": "ref",
      "expr": "eye",
      "unit": "-",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "EU-FR Tableau 2.4",
      "confidence": "read",
      "note": "Table 2.4: 'see eye exposure limits' (eye rows for the same band, skin aperture)."
    },
    {
      "id": "EU-S-IR1800-ps",
      "band_nm": [
        1800,
        2600
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "1e12",
      "unit": "W/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "EU-FR Tableau 2.4",
      "confidence": "read"
    },
    {
      "id": "EU-S-IR1800",
      "band_nm": [
        1800,
        2600
      ],
      "t_s": [
        1e-09,
        30000.0
      ],
      "quantity": "ref",
      "expr": "eye",
      "unit": "-",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "EU-FR Tableau 2.4",
      "confidence": "read",
      "note": "Table 2.4: 'see eye exposure limits' (eye rows for the same band, skin aperture)."
    },
    {
      "id": "EU-S-IR2600-ps",
      "band_nm": [
        2600,
        1000000.0
      ],
      "t_s": [
        1e-13,
        1e-09
      ],
      "quantity": "E",
      "expr": "1e11",
      "unit": "W/m^2",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "EU-FR Tableau 2.4",
      "confidence": "read"
    },
    {
      "id": "EU-S-IR2600",
      "band_nm": [
        2600,
        1000000.0
      ],
      "t_s": [
        1e-09,
        30000.0
      ],
      "quantity": "ref",
      "expr": "eye",
      "unit": "-",
      "effect": "skin thermal",
      "effectClass": "skin-thermal",
      "source": "EU-FR Tableau 2.4",
      "confidence": "read",
      "note": "Table 2.4: 'see eye exposure limits' (eye rows for the same band, skin aperture)."
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
          0.3
        ],
        "diameter_mm": "1",
        "source": "EU-FR Tableau 2.2 (column 'Diaphragme' for UV rows)",
        "confidence": "read"
      },
      {
        "band_nm": [
          180,
          400
        ],
        "t_s": [
          0.3,
          10
        ],
        "diameter_mm": "1.5*t^0.375",
        "source": "EU-FR Tableau 2.2",
        "confidence": "read"
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
        "source": "EU-2.3-MEM",
        "confidence": "from memory"
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
        "source": "EU-FR Tableau 2.2 (Table 2.3: memory)",
        "confidence": "read"
      },
      {
        "band_nm": [
          1400,
          100000.0
        ],
        "t_s": [
          1e-13,
          0.3
        ],
        "diameter_mm": "1",
        "source": "EU-FR Tableau 2.2 note b",
        "confidence": "read"
      },
      {
        "band_nm": [
          1400,
          100000.0
        ],
        "t_s": [
          0.3,
          10
        ],
        "diameter_mm": "1.5*t^0.375",
        "source": "EU-FR Tableau 2.2 note b",
        "confidence": "read"
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
        "source": "EU-2.3-MEM",
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
        "source": "EU-FR Tableau 2.2 note b",
        "confidence": "read"
      }
    ],
    "skin": [
      {
        "band_nm": [
          180,
          1000000.0
        ],
        "t_s": [
          1e-13,
          30000.0
        ],
        "diameter_mm": "3.5",
        "source": "EU-FR Tableau 2.4 (3.5 mm printed for every row, including 1e5-1e6 nm)",
        "confidence": "read"
      }
    ],
    "note": "Note b of Table 2.2 writes 't <= 0.3 s' / '0.3 s < t < 10 s'. 1.5*0.3^0.375 = 0.95 mm, a 5 % step at 0.3 s."
  },
  "repetitivePulses": {
    "rules": [
      {
        "n": 1,
        "text": "Each single pulse of a train must not exceed the limit for a single pulse of that duration.",
        "cite": "EU 2006/25/EC Annex II Table 2.6 rule 1 (read)",
        "source": "EU-FR Tableau 2.6; EU-CONS",
        "confidence": "read"
      },
      {
        "n": 2,
        "text": "Any group (or sub-group) of pulses delivered in a time t must not exceed the limit for duration t.",
        "cite": "EU 2006/25/EC Annex II Table 2.6 rule 2 (read)",
        "source": "EU-FR Tableau 2.6; EU-CONS",
        "confidence": "read"
      },
      {
        "n": 3,
        "text": "Each single pulse within a group must not exceed the single-pulse limit multiplied by CP = N^-0.25 (N = number of pulses). Applies only to limits protecting against thermal injury; pulses within Tmin count as one pulse.",
        "source": "EU-FR Tableau 2.6; EU-CONS",
        "confidence": "read"
      }
    ],
    "cp": {
      "expr": "N^(-0.25)",
      "appliesTo": [
        "retina-thermal",
        "cornea-lens-thermal",
        "cornea-lens-thermal-photochemical",
        "cornea-lens-unstated",
        "skin-thermal",
        "skin-unstated"
      ],
      "scopeNote": "C_P applies only to limits protecting against thermal injury (EU Table 2.6 rule 3); the limits here are photochemical",
      "pulsesShorterThan_s": "0.25",
      "source": "EU-FR Tableau 2.6; EU-CONS",
      "confidence": "read",
      "note": "All thermal limits (retina, cornea, skin) - the Directive does not restrict rule 3 to the retina and sets no cap on N. Rows whose mechanism the table does not state ('unstated') are treated as thermal: the stricter reading (ours). C_P only for pulses shorter than 0.25 s: BGI832 (read)."
    },
    "grouping": {
      "factor": "T_min",
      "edgeSide": "lower",
      "belowTable": {
        "below_nm": 315,
        "value_s": "1e-9",
        "source": "limit specification 5.6: gap in the Directive, 315-400 nm value used",
        "confidence": "ours"
      },
      "countAsOneIfPulseLongerThan_s": "1e-9",
      "source": "EU-FR Tableau 2.6 (T_min bands written lo < lambda <= hi: on an exact band edge the lower band's T_min applies, limit specification errata); BGI832 (read): pulses inside T_min count as one only if every pulse is longer than 1 ns; Table 2.2 note d sums UV pulses inside T_min but Table 2.6 lists no T_min below 315 nm",
      "confidence": "read"
    },
    "countingWindows": [
      {
        "band_nm": [180, 400],
        "uncappedNote": "no cap below 400 nm; the stricter reading, ours",
        "source": "BGI832 (read) gives caps only from 400 nm; ours below",
        "confidence": "ours"
      },
      {
        "band_nm": [400, 1400],
        "cap": { "factor": "T2" },
        "source": "BGI832 (read; reflects IEC 60825-1:2001 practice, the Directive itself is silent)",
        "confidence": "read"
      },
      {
        "band_nm": [1400, 1000000.0],
        "cap": { "seconds": "10", "label": "above 1400 nm" },
        "source": "BGI832 (read; reflects IEC 60825-1:2001 practice, the Directive itself is silent)",
        "confidence": "read"
      }
    ],
    "notes": [
      {
        "text": "Count N over the exposure duration assessed, at most T2 for 400-1400 nm and 10 s for longer wavelengths; apply CP only to pulses shorter than 0.25 s; pulses inside Ti (= Tmin) are counted as one and their energies summed against the limit for duration Ti, if every pulse is longer than 1 ns.",
        "source": "BGI832 (read; reflects IEC 60825-1:2001 practice, the Directive itself is silent)",
        "confidence": "read"
      }
    ]
  }
};
