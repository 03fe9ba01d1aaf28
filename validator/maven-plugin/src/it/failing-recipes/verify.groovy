import groovy.json.JsonSlurper

String log = new File(basedir, 'build.log').text
assert log.contains('[ERROR] FAIL recipes/parenteral-citrate-buffer-off-target.json: error ph-within-target /targets/pH: pH at 25 °C is')
assert log.contains('[ERROR] 1 document(s): 0 pass, 1 fail, 0 invalid, 0 indeterminate')
assert log.contains('Protolyte check did not pass (exit code 1):')
assert log.contains('BUILD FAILURE')

// the reports are written before the build fails, for CI to keep
def run = new JsonSlurper().parse(new File(basedir, 'target/protolyte/report.json'))
assert run.reports*.status == ['fail']
assert run.reports[0].findings*.rule.contains('ph-within-target')
assert new File(basedir, 'target/protolyte/report.txt').text.contains('parenteral-citrate-buffer-off-target.json')
return true
