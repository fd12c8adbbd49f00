// The far-field tool's request: the XML Debian's nf2ff reads (as openEMS's own CalcNF2FF.m writes it).
import { describe, expect, it } from 'vitest';
import { FAR_FIELD_PHI_DEG, FAR_FIELD_THETA_DEG, serializeFarFieldRequest } from '../../../src/lib/simulation';

const planes = [0, 1, 2, 3, 4, 5].map((f) => ({ eFile: `nearbox_E_${f}.h5`, hFile: `nearbox_H_${f}.h5` }));

describe('serializeFarFieldRequest', () => {
	it('asks for one frequency on the θ/φ sphere in radians, from the six faces of the near-field box', () => {
		const xml = serializeFarFieldRequest({ frequencyHz: 2.45e9, thetaDeg: [0, 90, 180], phiDeg: [0, 90, 180, 270], planes });
		expect(xml).toBe(
			[
				'<?xml version="1.0" encoding="UTF-8"?>',
				'<nf2ff Outfile="farfield.h5" freq="2450000000">',
				'  <theta>0,1.57079632679,3.14159265359</theta>',
				'  <phi>0,1.57079632679,3.14159265359,4.71238898038</phi>',
				...planes.map((p) => `  <Planes E_Field="${p.eFile}" H_Field="${p.hFile}"/>`),
				'</nf2ff>',
				''
			].join('\n')
		);
	});

	it('samples the runner’s sphere in 2° of θ and 5° of φ, with both cut planes and their opposites', () => {
		expect(FAR_FIELD_THETA_DEG[0]).toBe(0);
		expect(FAR_FIELD_THETA_DEG[FAR_FIELD_THETA_DEG.length - 1]).toBe(180);
		for (const phi of [0, 90, 180, 270]) expect(FAR_FIELD_PHI_DEG).toContain(phi);
		expect(FAR_FIELD_PHI_DEG).not.toContain(360);
	});

	it('refuses a request without near-field planes', () => {
		expect(() => serializeFarFieldRequest({ frequencyHz: 1e9, thetaDeg: [0], phiDeg: [0], planes: [] })).toThrow(RangeError);
	});
});
