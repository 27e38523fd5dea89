import { kastenYoungPowerFast } from '../../../src/core/sky/airMassFast';
import { kastenYoungPowerPlain } from '../../../src/core/sky/airMass';

// The fast twin of the Kasten & Young (1989) Eq. 3 power term against the formula as written
// (Math.pow): same value within 1e-14 relative over the whole altitude range and beyond it.
describe('the tabulated Kasten–Young power equals Math.pow of Eq. 3', () => {
  test('on a fine grid of altitudes, at every node and half-way between nodes, and outside 0…90°', () => {
    let worst = 0;
    const check = (beta: number) => {
      const plain = kastenYoungPowerPlain(beta);
      worst = Math.max(worst, Math.abs(kastenYoungPowerFast(beta) / plain - 1));
    };
    for (let k = 0; k <= 90_000; k++) check(k / 1000);
    for (let k = 0; k <= 512; k++) check((k * 90) / 512); // nodes and mid-points (node step 90/256)
    for (const beta of [-5, -0.5, -1e-9, 90 + 1e-9, 95, 1e-300]) check(beta);
    expect(worst).toBeLessThan(1e-14);
  });
});
