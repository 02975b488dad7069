// Reference humidity ratios for psychrometric chart curves from the npm package psychrolib
// (an open implementation of ASHRAE Handbook-Fundamentals 2017 ch. 1), in its SI mode.
// stdin: JSON {p_pa, points: [{t_c, rh, h}]}; stdout: JSON array of {w_sat, w_rh, w_h}.
const psy = require('psychrolib');
psy.SetUnitSystem(psy.SI);
let input = '';
process.stdin.on('data', (d) => { input += d; });
process.stdin.on('end', () => {
  const q = JSON.parse(input);
  const out = q.points.map((s) => ({
    w_sat: psy.GetSatHumRatio(s.t_c, q.p_pa),
    w_rh: psy.GetHumRatioFromRelHum(s.t_c, s.rh, q.p_pa),
    w_h: psy.GetHumRatioFromEnthalpyAndTDryBulb(s.h, s.t_c),
  }));
  process.stdout.write(JSON.stringify(out));
});
