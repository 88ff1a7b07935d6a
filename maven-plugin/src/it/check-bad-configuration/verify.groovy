def log = new File(basedir, 'build.log').text
// First build: the configuration file's mistake, located at the key, with a fix.
assert log.contains("mesolint: .mesolint.yaml:5:1: unknown key 'fail_on' in the repository configuration (fix: did you mean 'fail-on'?")
// Second build: the parameter named by its name and its user property.
assert log.contains("mesolint: failOn (mesolint.failOn): must be error, warning, info or none, not 'fatal'")
// Build errors (MojoExecutionException), never rule failures; nothing was checked.
assert log.count('MojoExecutionException') >= 2
assert !log.contains('MojoFailureException')
assert !log.contains('files checked')
return true
