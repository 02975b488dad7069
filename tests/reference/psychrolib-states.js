// Reference values from the npm package psychrolib (an open implementation of
// ASHRAE Handbook-Fundamentals 2017 ch. 1), in its SI mode.
// stdin: JSON array of {t_c, rh, z_m}; stdout: JSON array of the properties.
const psy = require('psychrolib');
psy.SetUnitSystem(psy.SI);
let input = '';
process.stdin.on('data', (d) => { input += d; });
process.stdin.on('end', () => {
  const states = JSON.parse(input);
  const out = states.map((s) => {
    const p = psy.GetStandardAtmPressure(s.z_m);
    const w = psy.GetHumRatioFromRelHum(s.t_c, s.rh, p);
    return {
      p_pa: p,
      w: w,
      v: psy.GetMoistAirVolume(s.t_c, w, p),
      h: psy.GetMoistAirEnthalpy(s.t_c, w),
      tdp_c: psy.GetTDewPointFromHumRatio(s.t_c, w, p),
      twb_c: psy.GetTWetBulbFromHumRatio(s.t_c, w, p),
      rho: psy.GetMoistAirDensity(s.t_c, w, p),
    };
  });
  process.stdout.write(JSON.stringify(out));
});
