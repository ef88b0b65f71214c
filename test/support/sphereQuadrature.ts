/**
 * Weights for integrating over the sphere a function sampled on the cell-centred grid that
 * patternOnSphere uses (θ_j = (j + ½)π/nθ, φ_i = (i + ½)2π/nφ): Fejér's first rule in
 * cos θ, whose nodes are exactly cos θ_j (Chebyshev points of the first kind), with
 *   w_j = (2/nθ) [1 - 2 Σ_{m=1}^{⌊nθ/2⌋} cos(2m θ_j) / (4m² - 1)]
 * (Fejér 1933; Waldvogel, BIT 46, 195, 2006, from memory), times the uniform φ weight 2π/nφ.
 * Both rules converge spectrally for functions smooth on the sphere. Returns Σ w f.
 */
export function integrateCellCentred(values: Float64Array, nTheta: number, nPhi: number): number {
  let total = 0;
  for (let j = 0; j < nTheta; j++) {
    const theta = ((j + 0.5) * Math.PI) / nTheta;
    let sum = 0;
    for (let m = 1; m <= Math.floor(nTheta / 2); m++) {
      sum += Math.cos(2 * m * theta) / (4 * m * m - 1);
    }
    const w = (2 / nTheta) * (1 - 2 * sum);
    let ring = 0;
    for (let i = 0; i < nPhi; i++) ring += values[j * nPhi + i];
    total += w * ring;
  }
  return (total * 2 * Math.PI) / nPhi;
}
