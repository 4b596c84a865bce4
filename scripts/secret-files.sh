#!/usr/bin/env bash
# Secret files under .data/ (database passwords and URLs, the session secret): readable by
# their owner only. Sourced by lib.sh; kept apart so a test can source it alone.

# The files lib.sh and the server write that hold a credential or a secret, relative to .data/.
SECRET_FILES=(pg-password pg-admin-url pg-app-password pg-url session-secret)

# write_secret FILE: stdin into FILE, mode 0600 from the moment it exists (umask 077 before the
# write). Written beside and renamed over FILE, so a reader (a jest worker reading pg-url while
# npm start runs) sees the old or the new content, never an empty file, and a FILE that existed
# with a wider mode is replaced by a 0600 one.
write_secret() {
  local tmp="$1.$$.tmp"
  (umask 077 && cat >"$tmp")
  chmod 600 "$tmp"
  mv -f "$tmp" "$1"
}

# protect_secrets DIR…: makes DIR 0700 and every secret file in it 0600. Clusters made before
# this ran have pg-password 0644; npm start and npm test call this on every run.
protect_secrets() {
  local dir name
  for dir in "$@"; do
    [ -d "$dir" ] || continue
    chmod 700 "$dir"
    for name in "${SECRET_FILES[@]}"; do
      if [ -f "$dir/$name" ]; then chmod 600 "$dir/$name"; fi
    done
  done
}
