//go:build linux && cgo

package ui

// Fyne reads the user's language from LC_ALL, LC_MESSAGES or LANG while its
// packages initialize, before any Go code of Upright runs, and logs "Error
// parsing user locale C" for the Debian default LANG=C.UTF-8 (the language
// "C" is not a language tag). The constructor below runs before the Go
// runtime starts: when the locale is C or POSIX with a codeset and LANGUAGE
// is unset, it sets LANGUAGE=en, the fallback Fyne reads next, and starts the
// program again so the Go runtime sees it. LANG itself is kept, so the
// character set of the program and of anything it starts is unchanged.

/*
#include <stdlib.h>
#include <string.h>
#include <unistd.h>

#ifdef __GLIBC__
extern char **environ;

static int uprightCodesetOnly(const char *v, const char *name) {
	size_t n = strlen(name);
	return strncmp(v, name, n) == 0 && (v[n] == '.' || v[n] == '@');
}

// glibc passes argc, argv and envp to every constructor.
__attribute__((constructor)) static void uprightLocaleFallback(int argc, char **argv, char **envp) {
	static const char *names[] = {"LC_ALL", "LC_MESSAGES", "LANG"};
	const char *v = NULL;
	for (int i = 0; i < 3; i++) {
		v = getenv(names[i]);
		if (v != NULL && v[0] != '\0') {
			break;
		}
		v = NULL;
	}
	if (v == NULL || argc < 1 || argv == NULL || argv[0] == NULL) {
		return;
	}
	const char *language = getenv("LANGUAGE");
	if (language != NULL && language[0] != '\0') {
		return;
	}
	if (!uprightCodesetOnly(v, "C") && !uprightCodesetOnly(v, "POSIX")) {
		return;
	}
	if (setenv("LANGUAGE", "en", 1) != 0) {
		return;
	}
	execve("/proc/self/exe", argv, environ);
	// exec failed: carry on in this process, with Fyne's message.
}
#endif
*/
import "C"
