#define _POSIX_C_SOURCE 199309L
/* The one timing harness of the C baselines (bench/nativeBaselines.bench.ts links it with each kernel file):
 * fills the input with `fill`, runs `kernel` over it `rounds` times and prints the best round in ns per element
 * and a checksum (so the compiler cannot drop the work). Usage: <binary> <elements> <rounds> */
#include <stdio.h>
#include <stdlib.h>
#include <time.h>

/* Defined by the kernel file: the input's i-th of n values, and the loop being timed. */
double fill(int i, int n);
void kernel(const double *in, double *out, int n);

static double now(void) {
  struct timespec ts;
  clock_gettime(CLOCK_MONOTONIC, &ts);
  return ts.tv_sec + ts.tv_nsec * 1e-9;
}

int main(int argc, char **argv) {
  int n = argc > 1 ? atoi(argv[1]) : 1000000, rounds = argc > 2 ? atoi(argv[2]) : 5;
  double *in = malloc(sizeof(double) * n), *out = malloc(sizeof(double) * n), best = 1e30, sink = 0;
  if (in == NULL || out == NULL) return 1;
  for (int i = 0; i < n; i++) in[i] = fill(i, n);
  for (int r = 0; r < rounds; r++) {
    double s = now();
    kernel(in, out, n);
    double dt = now() - s;
    if (dt < best) best = dt;
    sink += out[n / 2];
  }
  printf("%.4f %.17g\n", best * 1e9 / n, sink);
  return 0;
}
