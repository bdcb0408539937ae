#!/usr/bin/env bash
ROOT=$(cd "$(dirname "$0")/.." && pwd)
source "$ROOT/scripts/lib.sh"
mkdir -p "$ROOT/.data"
build_web
