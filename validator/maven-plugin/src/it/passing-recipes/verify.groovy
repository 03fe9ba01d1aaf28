import groovy.json.JsonSlurper

File reports = new File(basedir, 'target/protolyte')
File json = new File(reports, 'report.json')
assert json.isFile() : "no JSON report at ${json}"
def run = new JsonSlurper().parse(json)
assert run.summary.documents == 1
assert run.summary.pass == 1
assert run.reports*.status == ['pass']
assert run.reports[0].source.endsWith('recipes/cell-culture-hepes-basal-medium.json')
assert new File(reports, 'report.txt').text.contains('1 document(s): 1 pass, 0 fail, 0 invalid, 0 indeterminate')
// written atomically: no temporary file is left beside the reports
assert reports.list().sort() == ['report.json', 'report.txt']

String log = new File(basedir, 'build.log').text
assert log.contains('[INFO] 1 document(s): 1 pass, 0 fail, 0 invalid, 0 indeterminate')
assert log.contains('BUILD SUCCESS')
return true
