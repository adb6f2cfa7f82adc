/* The memory floor of a kernel that works on its own buffer, as hotjunction/bulk's WebAssembly kernel does: the
 * arrays of copy.c moved through a 32 KiB buffer (memcpy in, memcpy out, 4,096 elements at a time), no arithmetic.
 * Built by bench/nativeBaselines.bench.ts with harness.c and the same flags. */
#include <string.h>

enum { CHUNK = 4096 };
static double buffer[CHUNK];

double fill(int i, int n) { return 54.886 * i / n; }

void kernel(const double *e, double *t, int n) {
  for (int s = 0; s < n; s += CHUNK) {
    int m = n - s < CHUNK ? n - s : CHUNK;
    memcpy(buffer, e + s, m * sizeof(double));
    __asm__ volatile("" ::: "memory"); /* the buffer is really written and read */
    memcpy(t + s, buffer, m * sizeof(double));
  }
}
