/* The memory floor of the bulk baselines: the same arrays as approxInverse.c, copied (out[i] = in[i]), no
 * arithmetic. Built by bench/nativeBaselines.bench.ts with harness.c and the same flags; the approximate inverse's
 * time against this one says how much of it is moving the array through memory. */

double fill(int i, int n) { return 54.886 * i / n; }

void kernel(const double *e, double *t, int n) {
  for (int i = 0; i < n; i++) t[i] = e[i];
}
