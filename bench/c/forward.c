/* Baseline of the bulk forward conversion: type K's reference function (NIST SRD 60 / Monograph 175
 * coefficients, 0-1372 C sub-range and the exponential term) over an array, plain Horner, the same
 * operation order as the JavaScript path. Built by bench/nativeBaselines.bench.ts with harness.c and
 * gcc -O3 -march=native -ffp-contract=off (no fused multiply-add: the same arithmetic as JavaScript). */
#include <math.h>

static const double c[10] = {-0.017600413686, 0.038921204975, 1.8558770032e-5, -9.9457592874e-8, 3.1840945719e-10,
                             -5.6072844889e-13, 5.6075059059e-16, -3.2020720003e-19, 9.7151147152e-23, -1.2104721275e-26};
static const double a0 = 0.1185976, a1 = -0.0001183432, a2 = 126.9686;

double fill(int i, int n) { return 1372.0 * i / n; }

void kernel(const double *t, double *e, int n) {
  for (int i = 0; i < n; i++) {
    double x = t[i], acc = c[9];
    for (int k = 8; k >= 0; k--) acc = acc * x + c[k];
    double d = x - a2;
    e[i] = acc + a0 * exp(a1 * d * d);
  }
}
