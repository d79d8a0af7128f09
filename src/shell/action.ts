// GitHub Action entry. The action issue replaces this with the real run; until then it
// refuses clearly instead of pretending to judge anything.
import * as core from '@actions/core';

core.setFailed('netbrace: the GitHub Action entry is not wired yet in this build');
