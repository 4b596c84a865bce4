/** One answer of oracle.py's cmath mode: the parts as float.hex, or the exception cmath raised. */
export interface CmathAnswer {
  re?: string;
  im?: string;
  raises?: string;
}
