/*
 * The system C library's <complex.h> behind Sheetkeeper's stdio JSON-lines protocol
 * (docs/stdio-protocol.md; docs/c-and-numpy-adapters.md says how it is built and what it finds).
 *
 * Built by the harness on first use with `gcc -O2 -std=c11 ... -lm` (harness/adapters/c-adapter-binary.ts).
 * Never with -ffast-math: it lets GCC assume no infinities, NaNs or signed zeros, drop the
 * Annex G special cases of complex multiplication and division (-fcx-limited-range) and fold
 * x * 0.0 to 0.0, which would test the compiler's shortcuts instead of the library.
 *
 * The reader is small and strict: one JSON value per line, with the shapes the protocol uses
 * (objects, arrays, ASCII strings, integers for ids). Anything else is answered with the
 * protocol's error answers and the program keeps running.
 */
#define _GNU_SOURCE
#include <complex.h>
#include <errno.h>
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#ifdef __GLIBC__
#include <gnu/libc-version.h>
#endif

/* ---------- a strict JSON reader ---------- */

enum kind { J_NULL, J_BOOL, J_NUMBER, J_STRING, J_ARRAY, J_OBJECT };

typedef struct value {
  enum kind kind;
  char *text;              /* J_STRING: the decoded text; J_NUMBER: the token as written */
  int integer;             /* J_NUMBER: no fraction and no exponent */
  size_t count;            /* J_ARRAY, J_OBJECT: number of items */
  struct value **items;    /* J_ARRAY items; J_OBJECT values */
  char **keys;             /* J_OBJECT keys */
} value;

typedef struct {
  const char *at;
  const char *error;
  int depth;
} reader;

/* The protocol nests four deep (request, args, item, pair); anything much deeper is not ours. */
#define MAX_DEPTH 16

static void free_value(value *v) {
  if (!v) return;
  for (size_t i = 0; i < v->count; i++) {
    free_value(v->items[i]);
    if (v->keys) free(v->keys[i]);
  }
  free(v->items);
  free(v->keys);
  free(v->text);
  free(v);
}

static value *new_value(enum kind kind) {
  value *v = calloc(1, sizeof *v);
  if (!v) abort();
  v->kind = kind;
  return v;
}

static void skip_space(reader *r) {
  while (*r->at == ' ' || *r->at == '\t' || *r->at == '\r' || *r->at == '\n') r->at++;
}

static value *read_value(reader *r);

static char *read_string_text(reader *r) {
  /* r->at is on the opening quote. Only ASCII: every string of the protocol is a number, an op or an entry name. */
  const char *p = r->at + 1;
  size_t cap = 16, len = 0;
  char *out = malloc(cap);
  if (!out) abort();
  for (;;) {
    unsigned char c = (unsigned char)*p;
    if (c == '"') break;
    if (c == '\0') { r->error = "unterminated string"; free(out); return NULL; }
    if (c < 0x20) { r->error = "control character in a string"; free(out); return NULL; }
    if (c >= 0x80) { r->error = "non-ASCII character in a string"; free(out); return NULL; }
    if (c == '\\') {
      p++;
      switch (*p) {
        case '"': c = '"'; break;
        case '\\': c = '\\'; break;
        case '/': c = '/'; break;
        case 'b': c = '\b'; break;
        case 'f': c = '\f'; break;
        case 'n': c = '\n'; break;
        case 'r': c = '\r'; break;
        case 't': c = '\t'; break;
        case 'u': {
          unsigned code = 0;
          for (int i = 1; i <= 4; i++) {
            char h = p[i];
            unsigned d = h >= '0' && h <= '9' ? (unsigned)(h - '0')
                       : h >= 'a' && h <= 'f' ? (unsigned)(h - 'a' + 10)
                       : h >= 'A' && h <= 'F' ? (unsigned)(h - 'A' + 10) : 16u;
            if (d == 16u) { r->error = "bad \\u escape"; free(out); return NULL; }
            code = code * 16 + d;
          }
          if (code == 0 || code >= 0x80) { r->error = "\\u escape outside ASCII (or NUL) in a string"; free(out); return NULL; }
          c = (unsigned char)code;
          p += 4;
          break;
        }
        default: r->error = "bad escape in a string"; free(out); return NULL;
      }
    }
    if (len + 2 > cap) { cap *= 2; out = realloc(out, cap); if (!out) abort(); }
    out[len++] = (char)c;
    p++;
  }
  out[len] = '\0';
  r->at = p + 1;
  return out;
}

static value *read_number_token(reader *r) {
  const char *p = r->at, *start = p;
  int integer = 1;
  if (*p == '-') p++;
  if (*p == '0') p++;
  else if (*p >= '1' && *p <= '9') while (*p >= '0' && *p <= '9') p++;
  else { r->error = "bad number"; return NULL; }
  if (*p == '.') {
    integer = 0; p++;
    if (!(*p >= '0' && *p <= '9')) { r->error = "bad number"; return NULL; }
    while (*p >= '0' && *p <= '9') p++;
  }
  if (*p == 'e' || *p == 'E') {
    integer = 0; p++;
    if (*p == '+' || *p == '-') p++;
    if (!(*p >= '0' && *p <= '9')) { r->error = "bad number"; return NULL; }
    while (*p >= '0' && *p <= '9') p++;
  }
  value *v = new_value(J_NUMBER);
  v->integer = integer && (p - start) <= 18;
  v->text = strndup(start, (size_t)(p - start));
  if (!v->text) abort();
  r->at = p;
  return v;
}

static int push(value *v, value *item, char *key) {
  v->items = realloc(v->items, (v->count + 1) * sizeof *v->items);
  if (!v->items) abort();
  if (v->kind == J_OBJECT) {
    v->keys = realloc(v->keys, (v->count + 1) * sizeof *v->keys);
    if (!v->keys) abort();
    v->keys[v->count] = key;
  }
  v->items[v->count++] = item;
  return 1;
}

static value *read_container(reader *r, enum kind kind) {
  char close = kind == J_ARRAY ? ']' : '}';
  if (++r->depth > MAX_DEPTH) { r->error = "nested too deep"; return NULL; }
  value *v = new_value(kind);
  r->at++;
  skip_space(r);
  if (*r->at == close) { r->at++; r->depth--; return v; }
  for (;;) {
    char *key = NULL;
    skip_space(r);
    if (kind == J_OBJECT) {
      if (*r->at != '"') { r->error = "expected a key"; free_value(v); return NULL; }
      key = read_string_text(r);
      if (!key) { free_value(v); return NULL; }
      skip_space(r);
      if (*r->at != ':') { r->error = "expected ':'"; free(key); free_value(v); return NULL; }
      r->at++;
    }
    value *item = read_value(r);
    if (!item) { free(key); free_value(v); return NULL; }
    push(v, item, key);
    skip_space(r);
    if (*r->at == ',') { r->at++; continue; }
    if (*r->at == close) { r->at++; r->depth--; return v; }
    r->error = kind == J_ARRAY ? "expected ',' or ']'" : "expected ',' or '}'";
    free_value(v);
    return NULL;
  }
}

static value *read_value(reader *r) {
  skip_space(r);
  switch (*r->at) {
    case '{': return read_container(r, J_OBJECT);
    case '[': return read_container(r, J_ARRAY);
    case '"': {
      char *text = read_string_text(r);
      if (!text) return NULL;
      value *v = new_value(J_STRING);
      v->text = text;
      return v;
    }
    case 't': if (!strncmp(r->at, "true", 4)) { r->at += 4; return new_value(J_BOOL); } break;
    case 'f': if (!strncmp(r->at, "false", 5)) { r->at += 5; return new_value(J_BOOL); } break;
    case 'n': if (!strncmp(r->at, "null", 4)) { r->at += 4; return new_value(J_NULL); } break;
    default:
      if (*r->at == '-' || (*r->at >= '0' && *r->at <= '9')) return read_number_token(r);
  }
  r->error = *r->at ? "unexpected character" : "unexpected end of line";
  return NULL;
}

static value *member(const value *object, const char *key) {
  for (size_t i = 0; i < object->count; i++)
    if (!strcmp(object->keys[i], key)) return object->items[i];
  return NULL;
}

/* ---------- writing ---------- */

static void write_string(const char *s) {
  putchar('"');
  for (; *s; s++) {
    unsigned char c = (unsigned char)*s;
    if (c == '"' || c == '\\') printf("\\%c", c);
    else if (c < 0x20 || c >= 0x7f) printf("\\u%04x", c);
    else putchar(c);
  }
  putchar('"');
}

/* The shortest decimal that reads back to the same double (%.17g always does; fewer digits often do). */
static void write_double(double x) {
  char buf[40];
  if (isnan(x)) { fputs("\"nan\"", stdout); return; }
  if (isinf(x)) { fputs(x > 0 ? "\"inf\"" : "\"-inf\"", stdout); return; }
  for (int digits = 1; digits <= 17; digits++) {
    snprintf(buf, sizeof buf, "%.*g", digits, x);
    if (strtod(buf, NULL) == x) break;
  }
  printf("\"%s\"", buf);
}

static void write_pair(double complex z) {
  putchar('[');
  write_double(creal(z));
  putchar(',');
  write_double(cimag(z));
  putchar(']');
}

static void write_error_slot(const char *text) {
  fputs("{\"error\":", stdout);
  write_string(text);
  putchar('}');
}

static void write_id(const value *id) {
  if (id && id->kind == J_NUMBER && id->integer) fputs(id->text, stdout);
  else fputs("null", stdout);
}

static void answer_error(const value *id, const char *text) {
  fputs("{\"id\":", stdout);
  write_id(id);
  fputs(",\"error\":", stdout);
  write_string(text);
  fputs("}\n", stdout);
}

/* ---------- numbers and entries ---------- */

/*
 * A wire number (docs/stdio-protocol.md, "Numbers") read by strtod: decimals correctly rounded,
 * C99 hex floats exactly, "inf", "-inf", "nan", "-0". The whole string must be the number
 * (no spaces, nothing after it) and strtod's "infinity" and "nan(...)" spellings are refused.
 */
static int read_double(const value *v, double *out, char *why, size_t why_size) {
  if (!v || v->kind != J_STRING) { snprintf(why, why_size, "numbers travel as strings"); return 0; }
  const char *s = v->text;
  const char *body = (*s == '-' || *s == '+') ? s + 1 : s;
  if (!*s || *s == ' ' || !strcmp(body, "infinity") || strchr(s, '(')) {
    snprintf(why, why_size, "not a number: \"%.40s\"", s);
    return 0;
  }
  char *end;
  errno = 0;
  double x = strtod(s, &end);
  if (*end != '\0' || end == s) { snprintf(why, why_size, "not a number: \"%.40s\"", s); return 0; }
  *out = x;
  return 1;
}

/* An entry is a way the value is built from its two parts (docs/c-and-numpy-adapters.md, "Entries"). */
typedef double complex (*builder)(double re, double im);

/* CMPLX (C11 7.3.9.3): "as if" an imaginary part were built in place, so both zero signs and infinities survive. */
static double complex build_cmplx(double re, double im) { return CMPLX(re, im); }

/*
 * The everyday spelling. GCC has no imaginary type, so I is the complex float 0 + 1i and im * I is
 * computed as (im * 0, im * 1): an infinite or NaN im makes the real part NaN, and re + (−0) turns
 * a −0 real part into +0 when im is +0 or positive (the probe in the docs shows both).
 */
static double complex build_arithmetic(double re, double im) { return re + im * I; }

typedef struct {
  const char *name;
  const char *call;
  builder build;
  const char *carries;
} entry;

/* Declared beside discovery as harness/adapters/c-complex-entries.ts; a test holds the two equal. */
static const entry ENTRIES[] = {
    {"cmplx", "CMPLX(re, im)", build_cmplx,
     "{\"imaginaryPart\":true,\"realZeroSign\":true,\"imaginaryZeroSign\":true}"},
    {"arithmetic", "re + im * I", build_arithmetic,
     "{\"imaginaryPart\":true,\"realZeroSign\":false,\"imaginaryZeroSign\":true}"},
};
#define ENTRY_COUNT (sizeof ENTRIES / sizeof ENTRIES[0])

static int read_complex(const value *pair, const entry *e, double complex *out, char *why, size_t why_size) {
  if (!pair || pair->kind != J_ARRAY || pair->count != 2) {
    snprintf(why, why_size, "a complex number is a pair [re, im]");
    return 0;
  }
  double re, im;
  if (!read_double(pair->items[0], &re, why, why_size) || !read_double(pair->items[1], &im, why, why_size)) return 0;
  *out = e->build(re, im);
  return 1;
}

/* ---------- operations ---------- */

static double complex op_neg(double complex z) { return -z; }
static double complex op_add(double complex a, double complex b) { return a + b; }
static double complex op_sub(double complex a, double complex b) { return a - b; }
static double complex op_mul(double complex a, double complex b) { return a * b; }
static double complex op_div(double complex a, double complex b) { return a / b; }

typedef struct {
  const char *op;
  double complex (*one)(double complex);
  double complex (*two)(double complex, double complex);
} operation;

/* Sorted by name, as describe lists them. add/sub/mul/div/neg are C's own operators (GCC's __muldc3 and __divdc3). */
static const operation OPERATIONS[] = {
    {"acos", cacos, NULL},   {"acosh", cacosh, NULL}, {"add", NULL, op_add},   {"asin", casin, NULL},
    {"asinh", casinh, NULL}, {"atan", catan, NULL},   {"atanh", catanh, NULL}, {"div", NULL, op_div},
    {"exp", cexp, NULL},     {"log", clog, NULL},     {"mul", NULL, op_mul},   {"neg", op_neg, NULL},
    {"pow", NULL, cpow},     {"sqrt", csqrt, NULL},   {"sub", NULL, op_sub},
};
#define OPERATION_COUNT (sizeof OPERATIONS / sizeof OPERATIONS[0])

static void describe(const value *id) {
  fputs("{\"id\":", stdout);
  write_id(id);
#ifdef __GLIBC__
  fputs(",\"library\":\"glibc\",\"version\":", stdout);
  write_string(gnu_get_libc_version());
#else
  fputs(",\"library\":\"libc\",\"version\":\"unknown\"", stdout);
#endif
  fputs(",\"ops\":[", stdout);
  for (size_t i = 0; i < OPERATION_COUNT; i++) {
    if (i) putchar(',');
    write_string(OPERATIONS[i].op);
  }
  /* ISO/IEC 9899:2011 G.6: the sign of a zero picks the side of a cut. */
  fputs("],\"convention\":\"signed-zero\",\"entries\":[", stdout);
  for (size_t i = 0; i < ENTRY_COUNT; i++) {
    if (i) putchar(',');
    fputs("{\"name\":", stdout);
    write_string(ENTRIES[i].name);
    fputs(",\"call\":", stdout);
    write_string(ENTRIES[i].call);
    printf(",\"default\":%s,\"carries\":%s}", i == 0 ? "true" : "false", ENTRIES[i].carries);
  }
  fputs("]}\n", stdout);
}

/* One call: a value, or an error in its own slot. */
static void call(const operation *o, const value *item, const entry *e) {
  char why[128];
  double complex a, b;
  if (o->one) {
    if (!read_complex(item, e, &a, why, sizeof why)) { write_error_slot(why); return; }
    write_pair(o->one(a));
    return;
  }
  if (!item || item->kind != J_ARRAY || item->count != 2) {
    snprintf(why, sizeof why, "%s takes a list of two pairs", o->op);
    write_error_slot(why);
    return;
  }
  if (!read_complex(item->items[0], e, &a, why, sizeof why) || !read_complex(item->items[1], e, &b, why, sizeof why)) {
    write_error_slot(why);
    return;
  }
  write_pair(o->two(a, b));
}

/* Each way the value can be built, read back before any function runs (docs/stdio-protocol.md, "entry-points"). */
static void entry_points(const value *item) {
  putchar('{');
  for (size_t i = 0; i < ENTRY_COUNT; i++) {
    char why[128];
    double complex z;
    if (i) putchar(',');
    write_string(ENTRIES[i].name);
    putchar(':');
    if (read_complex(item, &ENTRIES[i], &z, why, sizeof why)) write_pair(z);
    else write_error_slot(why);
  }
  putchar('}');
}

static void answer(const value *request) {
  const value *id = request->kind == J_OBJECT ? member(request, "id") : NULL;
  const value *op = request->kind == J_OBJECT ? member(request, "op") : NULL;
  const value *args = request->kind == J_OBJECT ? member(request, "args") : NULL;
  const value *entry_name = request->kind == J_OBJECT ? member(request, "entry") : NULL;
  if (request->kind != J_OBJECT || !op || op->kind != J_STRING || !args || args->kind != J_ARRAY) {
    answer_error(id, "a request is {\"id\", \"op\", \"args\": [...]}");
    return;
  }
  if (!strcmp(op->text, "describe")) { describe(id); return; }
  const entry *e = &ENTRIES[0];
  if (entry_name) {
    e = NULL;
    for (size_t i = 0; i < ENTRY_COUNT && entry_name->kind == J_STRING; i++)
      if (!strcmp(ENTRIES[i].name, entry_name->text)) e = &ENTRIES[i];
    if (!e) {
      char why[160];
      snprintf(why, sizeof why, "no entry \"%.40s\"; the entries are cmplx, arithmetic",
               entry_name->kind == J_STRING ? entry_name->text : "(not a string)");
      answer_error(id, why);
      return;
    }
  }
  const operation *o = NULL;
  for (size_t i = 0; i < OPERATION_COUNT; i++)
    if (!strcmp(OPERATIONS[i].op, op->text)) o = &OPERATIONS[i];
  int echo = !strcmp(op->text, "echo"), points = !strcmp(op->text, "entry-points");
  if (!o && !echo && !points) {
    char why[96];
    snprintf(why, sizeof why, "unsupported op \"%.40s\"", op->text);
    answer_error(id, why);
    return;
  }
  fputs("{\"id\":", stdout);
  write_id(id);
  fputs(",\"results\":[", stdout);
  for (size_t i = 0; i < args->count; i++) {
    if (i) putchar(',');
    if (points) { entry_points(args->items[i]); continue; }
    if (echo) {
      /* Read exactly as a catalogue operation reads its argument, then written back: no library function in the way. */
      char why[128];
      double complex z;
      if (read_complex(args->items[i], e, &z, why, sizeof why)) write_pair(z);
      else write_error_slot(why);
      continue;
    }
    call(o, args->items[i], e);
  }
  fputs("]}\n", stdout);
}

int main(void) {
  char *line = NULL;
  size_t cap = 0;
  ssize_t len;
  while ((len = getline(&line, &cap, stdin)) != -1) {
    if ((size_t)len != strlen(line)) { answer_error(NULL, "not JSON: NUL character in the line"); fflush(stdout); continue; }
    reader r = {line, NULL, 0};
    skip_space(&r);
    if (!*r.at) continue;
    value *request = read_value(&r);
    if (request) {
      skip_space(&r);
      if (*r.at) { r.error = "text after the JSON value"; free_value(request); request = NULL; }
    }
    if (!request) {
      char why[96];
      snprintf(why, sizeof why, "not JSON: %s at column %ld", r.error, (long)(r.at - line) + 1);
      answer_error(NULL, why);
    } else {
      answer(request);
      free_value(request);
    }
    fflush(stdout);
  }
  free(line);
  return 0;
}
