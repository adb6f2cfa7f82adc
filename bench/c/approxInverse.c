/* Baseline of the bulk inverse: the published approximate inverse of type K (NIST SRD 60 / Monograph 175
 * inverse coefficients, three EMF ranges, degree 9) over an array, plain Horner. Built by
 * bench/nativeBaselines.bench.ts with harness.c and gcc -O3 -march=native -ffp-contract=off. */

static const double r0[10] = {0.0, 25.173462, -1.1662878, -1.0833638, -0.8977354, -0.37342377, -0.086632643, -0.010450598, -0.00051920577, 0.0};
static const double r1[10] = {0.0, 25.08355, 0.07860106, -0.2503131, 0.0831527, -0.01228034, 0.0009804036, -4.41303e-5, 1.057734e-6, -1.052755e-8};
static const double r2[10] = {-131.8058, 48.30222, -1.646031, 0.05464731, -0.0009650715, 8.802193e-6, -3.11081e-8, 0.0, 0.0, 0.0};

double fill(int i, int n) { return 54.886 * i / n; }

void kernel(const double *e, double *t, int n) {
  for (int i = 0; i < n; i++) {
    double x = e[i];
    const double *c = x < 0.0 ? r0 : x < 20.644 ? r1 : r2;
    double acc = c[9];
    for (int k = 8; k >= 0; k--) acc = acc * x + c[k];
    t[i] = acc;
  }
}
