import { ch4ErfAr6 } from '../forcing/ch4.js';
import { co2ErfAr6, co2ForcingLog, forcingOfDoubling } from '../forcing/co2.js';
import { n2oErfAr6 } from '../forcing/n2o.js';
import { closeTo, withinRange, type PublishedCheck } from './published-check.js';

/**
 * 2019 concentrations: CO2 410.1 ppm, CH4 1866.3 ppb, N2O 332.1 ppb (IPCC AR6 WG1 chapter 2; CO2 and
 * N2O from memory, CH4 confirmed), as test/reference/ar6-forcing.test.ts uses them.
 */
const Y2019 = { co2Ppm: 410.1, ch4Ppb: 1866.3, n2oPpb: 332.1 };

/** The AR6 ERF of CO2, CH4 and N2O in 2019 (Table 7.8 best estimates, rounded to 0.01 W m-2, so ±0.005). */
export const ar6GasForcing2019: PublishedCheck = {
  id: 'forcing-2019',
  run: () => {
    const source = 'IPCC AR6 WG1 ch. 7, Table 7.8 (formulas of 7.SM.1.1, Meinshausen et al. 2020)';
    const { co2Ppm, ch4Ppb, n2oPpb } = Y2019;
    return [
      closeTo('CO2 ERF 2019 vs 1750', source, co2ErfAr6(co2Ppm, n2oPpb), 2.16, 0.005, 'W m-2', 3),
      closeTo('CH4 ERF 2019 vs 1750', source, ch4ErfAr6(ch4Ppb, n2oPpb), 0.54, 0.005, 'W m-2', 3),
      closeTo('N2O ERF 2019 vs 1750', source, n2oErfAr6(n2oPpb, co2Ppm, ch4Ppb), 0.21, 0.005, 'W m-2', 3),
    ];
  },
};

/** The ERF of doubled CO2: AR6 3.93 ± 0.47 W m-2, and Myhre et al. 1998's 5.35 ln 2 = 3.71 W m-2. */
export const doublingForcing: PublishedCheck = {
  id: 'forcing-2xco2',
  run: () => [
    withinRange('ERF of 2xCO2 (AR6 formula)', 'IPCC AR6 WG1 7.3.2.1', '3.93 [3.46-4.40]', forcingOfDoubling('ar6'), 3.46, 4.4, 'W m-2', 3),
    closeTo('ERF of 2xCO2, central value (AR6 formula)', 'IPCC AR6 WG1 7.3.2.1', forcingOfDoubling('ar6'), 3.93, 0.005, 'W m-2', 3),
    closeTo('ERF of 2xCO2 (log formula)', 'Myhre et al. 1998, GRL 25, 2715', co2ForcingLog(2 * 278.3), 3.71, 0.005, 'W m-2', 3),
  ],
};
