import type { DataSource, EntityManager } from "typeorm";
import type { StormReportDto, StormReportListDto, StormReportsQuery, StormReportUploadDto } from "../../shared/api/storm-reports.ts";
import { parseStormReportCsv, StormReportFileError, type StormReportRow } from "../../shared/storm-reports/storm-report-csv.ts";
import { DUPLICATE_MINUTES, isDuplicateReport } from "../../shared/storm-reports/duplicate-reports.ts";
import type { StormReportKind } from "../../shared/storm-reports/storm-report-kinds.ts";
import { StormReportEntity } from "../entities/storm-report.entity.ts";
import { appendAudit, type AuditActor } from "../audit/audit-log.ts";
import { writeTransaction } from "../db/data-source.ts";
import { AppError } from "../errors.ts";

export function toStormReportDto(row: StormReportEntity): StormReportDto {
  return {
    id: row.id,
    time: row.time,
    latitude: row.latitude,
    longitude: row.longitude,
    kind: row.kind,
    magnitude: row.magnitude,
    magnitudeUnit: row.magnitudeUnit,
    magnitudeSi: row.magnitudeSi,
    remarks: row.remarks,
    source: row.source,
    invented: Boolean(row.invented),
    uploadedBy: row.uploadedBy,
    uploadedAt: row.uploadedAt,
  };
}

const shiftMinutes = (iso: string, minutes: number) => new Date(Date.parse(iso) + minutes * 60_000).toISOString();

/** Observed storm reports: CSV uploads checked row by row, duplicates recognised, and reads for maps and scores. */
export class StormReportService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly now: () => Date = () => new Date(),
  ) {}

  /**
   * Stores the good rows of a CSV file in one transaction with its audit entry. Bad rows are
   * refused with their line and reason; rows repeating a stored report (or an earlier row of the
   * same file) are recognised as duplicates and not stored again.
   */
  async upload(actor: AuditActor, fileName: string, text: string): Promise<StormReportUploadDto> {
    let parsed;
    try {
      parsed = parseStormReportCsv(text, this.now());
    } catch (error) {
      if (error instanceof StormReportFileError) throw new AppError(422, "STORM_REPORTS_INVALID", error.message, { line: error.line });
      throw error;
    }
    const refused = parsed.flatMap((row) => (row.ok ? [] : [{ line: row.line, reason: row.reason }]));
    const good = parsed.flatMap((row) => (row.ok ? [{ line: row.line, report: row.report }] : []));
    return writeTransaction(this.dataSource, async (m) => {
      // Checked inside the write transaction, which runs alone, so two uploads cannot both store one event.
      const known = await this.storedNear(m, good.map((g) => g.report));
      const accepted: Array<{ line: number; report: StormReportRow }> = [];
      const duplicates: StormReportUploadDto["duplicates"] = [];
      for (const row of good) {
        const stored = known.find((k) => isDuplicateReport(k, row.report));
        const earlier = stored ? undefined : accepted.find((a) => isDuplicateReport(a.report, row.report));
        if (stored || earlier) duplicates.push({ line: row.line, duplicateOfReportId: stored?.id ?? null, duplicateOfLine: earlier?.line ?? null });
        else accepted.push(row);
      }
      const saved = await this.insert(m, actor, fileName, accepted.map((a) => a.report), false);
      await appendAudit(m, actor, {
        action: "storm_reports.uploaded",
        targetType: "storm_reports",
        targetId: null,
        after: { fileName, rows: parsed.length, stored: saved.length, duplicates: duplicates.length, refused: refused.length, reportIds: saved.map((r) => r.id) },
      });
      return { fileName, rows: parsed.length, stored: saved.map(toStormReportDto), duplicates, refused };
    });
  }

  /** Stores already-checked reports as one batch (the invented demo set uses this). */
  async storeInvented(actor: AuditActor, source: string, reports: readonly StormReportRow[]): Promise<StormReportDto[]> {
    return writeTransaction(this.dataSource, async (m) => {
      const saved = await this.insert(m, actor, source, reports, true);
      await appendAudit(m, actor, { action: "storm_reports.seeded", targetType: "storm_reports", targetId: null, after: { source, stored: saved.length, invented: true } });
      return saved.map(toStormReportDto);
    });
  }

  async list(query: StormReportsQuery): Promise<StormReportListDto> {
    const rows = await this.find({ from: query.from, to: query.to, kinds: query.kind ? [query.kind] : undefined, limit: query.limit + 1 });
    return { reports: rows.slice(0, query.limit).map(toStormReportDto), truncated: rows.length > query.limit };
  }

  /** Reports in a time span (inclusive), oldest first, optionally of some kinds only. */
  async find(filter: { from?: string; to?: string; kinds?: readonly StormReportKind[]; limit?: number }): Promise<StormReportEntity[]> {
    const qb = this.dataSource.getRepository(StormReportEntity).createQueryBuilder("r");
    if (filter.from) qb.andWhere("r.time >= :from", { from: new Date(filter.from).toISOString() });
    if (filter.to) qb.andWhere("r.time <= :to", { to: new Date(filter.to).toISOString() });
    if (filter.kinds && filter.kinds.length > 0) qb.andWhere("r.kind IN (:...kinds)", { kinds: [...filter.kinds] });
    qb.orderBy("r.time", "ASC").addOrderBy("r.id", "ASC");
    if (filter.limit) qb.take(filter.limit);
    return qb.getMany();
  }

  /** Stored reports close enough in time to any of the rows to be one of their duplicates. */
  private async storedNear(m: EntityManager, rows: readonly StormReportRow[]): Promise<StormReportEntity[]> {
    if (rows.length === 0) return [];
    const times = rows.map((r) => r.time).sort();
    return m
      .getRepository(StormReportEntity)
      .createQueryBuilder("r")
      .where("r.time >= :from AND r.time <= :to", { from: shiftMinutes(times[0]!, -DUPLICATE_MINUTES), to: shiftMinutes(times.at(-1)!, DUPLICATE_MINUTES) })
      .getMany();
  }

  private async insert(m: EntityManager, actor: AuditActor, source: string, reports: readonly StormReportRow[], invented: boolean): Promise<StormReportEntity[]> {
    if (reports.length === 0) return [];
    const uploadedAt = this.now().toISOString();
    const repo = m.getRepository(StormReportEntity);
    return repo.save(
      reports.map((r) => repo.create({ ...r, source: source.slice(0, 200), invented, uploadedBy: actor.username, uploadedAt })),
      { chunk: 200 },
    );
  }
}
